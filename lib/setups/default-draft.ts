import { DEFAULT_TETHER, DEFAULT_WIND_MEASUREMENT } from "@/lib/domain";
import type { SetupDraft } from "./setup-draft";

interface ModelForDefaults {
  id: string;
  name: string;
  railStartXM: number;
  railEndXM: number;
}

// A new setup starts as an empty mount in the middle of the rail at a sea-level site in a light
// breeze, with a light braided line: a neutral start the customer edits.
export function defaultDraft(model: ModelForDefaults, mountId: string, name?: string): SetupDraft {
  return {
    name: name ?? `New setup on ${model.name}`,
    modelId: model.id,
    unitId: null,
    mountId,
    mountPositionXM: (model.railStartXM + model.railEndXM) / 2,
    site: {
      siteName: "",
      altitudeM: 0,
      temperatureC: null,
      pressurePa: null,
      windMS: 3,
      gustMS: 6,
      ...DEFAULT_WIND_MEASUREMENT,
      relativeHumidity: null,
    },
    gas: { purity: 0.98, superheatK: 0, fillFraction: 1 },
    tether: { ...DEFAULT_TETHER },
    targetHeightM: null,
    payloads: [],
  };
}
