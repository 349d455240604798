"use client";
import { DEFAULT_TETHER, DEFAULT_WIND_MEASUREMENT, INPUT_LIMITS as L, MAX_NAME_LENGTH } from "@/lib/domain";
import { usePlanner, usePlannerActions } from "./planner-context";
import { NumberInput } from "@/components/ui/number-input";
import type { Quantity } from "@/lib/units";
import { QuantityInput } from "./quantity-input";
import { Section } from "./section";

/** Where a reading is usually taken: a hand-held meter at head height, or a 10 m mast (WMO-No. 8). */
const HAND_HELD_M = 2;
const MAST_M = DEFAULT_WIND_MEASUREMENT.windMeasuredAtM;
const OPEN_GROUND_SHEAR = DEFAULT_WIND_MEASUREMENT.windShearExponent;

const selectClass = "mt-0.5 block w-full rounded border border-hairline bg-white px-2 py-1 text-sm text-ink";

/** Where the wind was read and how it grows with height: the lifter flies in the wind at its own height. */
function WindMeasurement() {
  const site = usePlanner((s) => s.draft.site);
  const units = usePlanner((s) => s.unitSystem);
  const { setSite } = usePlannerActions();
  const at = site.windMeasuredAtM === HAND_HELD_M ? "hand" : site.windMeasuredAtM === MAST_M ? "mast" : "other";
  const shear = site.windShearExponent === OPEN_GROUND_SHEAR ? "open" : site.windShearExponent === 0 ? "uniform" : "other";
  return (
    <>
      <label className="block text-sm text-muted">
        Wind measured
        <select
          className={selectClass}
          value={at}
          data-testid="wind-measured-at-select"
          onChange={(e) => {
            const choice = e.target.value;
            if (choice === "hand") setSite({ windMeasuredAtM: HAND_HELD_M });
            else if (choice === "mast") setSite({ windMeasuredAtM: MAST_M });
            else setSite({ windMeasuredAtM: 5 });
          }}
        >
          <option value="hand">hand-held, about 2 m up</option>
          <option value="mast">on a 10 m mast, or a forecast</option>
          <option value="other">at another height…</option>
        </select>
      </label>
      {at === "other" && (
        <QuantityInput
          label="Measured at height"
          quantity="length"
          valueSI={site.windMeasuredAtM}
          unitSystem={units}
          minSI={L.windMeasuredAtM.min}
          maxSI={L.windMeasuredAtM.max}
          onCommit={(v) => v !== null && setSite({ windMeasuredAtM: v })}
          testId="wind-measured-at-input"
        />
      )}
      <label className="block text-sm text-muted">
        Wind with height
        <select
          className={selectClass}
          value={shear}
          data-testid="wind-shear-select"
          onChange={(e) => {
            const choice = e.target.value;
            setSite({ windShearExponent: choice === "open" ? OPEN_GROUND_SHEAR : choice === "uniform" ? 0 : 0.25 });
          }}
        >
          <option value="open">grows as over open ground (1/7 power)</option>
          <option value="uniform">the same at every height</option>
          <option value="other">another power…</option>
        </select>
      </label>
      {shear === "other" && (
        <NumberInput
          label="Power of height"
          value={site.windShearExponent}
          decimals={3}
          min={L.windShearExponent.min}
          max={L.windShearExponent.max}
          onCommit={(v) => v !== null && setSite({ windShearExponent: v })}
          testId="wind-shear-input"
        />
      )}
    </>
  );
}

interface SiteFigureSpec {
  key: "altitudeM" | "temperatureC" | "windMS" | "gustMS" | "relativeHumidity";
  label: string;
  quantity: Quantity;
  testId: string;
  /** What an empty field means, when it may be empty. */
  placeholder?: string;
}

const SITE_FIGURES: readonly SiteFigureSpec[] = [
  { key: "altitudeM", label: "Altitude above sea level", quantity: "length", testId: "altitude-input" },
  { key: "temperatureC", label: "Air temperature", quantity: "temperature", testId: "temperature-input", placeholder: "standard" },
  { key: "windMS", label: "Wind", quantity: "speed", testId: "wind-input" },
  { key: "gustMS", label: "Gusts", quantity: "speed", testId: "gust-input", placeholder: "none" },
  // Empty is dry air (humid air is lighter and lifts less).
  { key: "relativeHumidity", label: "Relative humidity", quantity: "ratio", testId: "humidity-input", placeholder: "dry" },
];

function SiteFigure({ figure }: { figure: SiteFigureSpec }) {
  const valueSI = usePlanner((s) => s.draft.site[figure.key]);
  const units = usePlanner((s) => s.unitSystem);
  const { setSite } = usePlannerActions();
  const optional = figure.placeholder !== undefined;
  return (
    <QuantityInput
      label={figure.label}
      quantity={figure.quantity}
      valueSI={valueSI}
      unitSystem={units}
      minSI={L[figure.key].min}
      maxSI={L[figure.key].max}
      optional={optional}
      placeholder={figure.placeholder}
      onCommit={(v) => (v !== null || optional) && setSite({ [figure.key]: v })}
      testId={figure.testId}
    />
  );
}

export function SiteSection() {
  const site = usePlanner((s) => s.draft.site);
  const { setSite } = usePlannerActions();
  return (
    <Section title="Site" testId="section-site">
      <div className="grid grid-cols-2 gap-3 sm:grid-cols-3">
        <label className="col-span-2 block text-sm text-muted sm:col-span-3">
          Site name
          <input
            className="mt-0.5 w-full rounded border border-hairline bg-white px-2 py-1"
            defaultValue={site.siteName}
            maxLength={MAX_NAME_LENGTH}
            onBlur={(e) => {
              const siteName = e.target.value.trim();
              if (siteName !== site.siteName) setSite({ siteName });
            }}
          />
        </label>
        {SITE_FIGURES.slice(0, 4).map((figure) => (
          <SiteFigure key={figure.key} figure={figure} />
        ))}
        <WindMeasurement />
        <SiteFigure figure={SITE_FIGURES[4]} />
      </div>
    </Section>
  );
}

const GAS_PERCENTAGES = [
  { key: "purity", label: "Helium purity (rest is air)", testId: "purity-input" },
  { key: "fillFraction", label: "Fill", testId: "fill-input" },
] as const;

export function GasSection() {
  const gas = usePlanner((s) => s.draft.gas);
  const units = usePlanner((s) => s.unitSystem);
  const { setGas } = usePlannerActions();
  return (
    <Section title="Gas" testId="section-gas" defaultOpen={false}>
      <div className="grid grid-cols-2 gap-3 sm:grid-cols-3">
        {GAS_PERCENTAGES.map(({ key, label, testId }) => (
          <QuantityInput
            key={key}
            label={label}
            quantity="ratio"
            valueSI={gas[key]}
            unitSystem={units}
            minSI={L[key].min}
            maxSI={L[key].max}
            onCommit={(v) => v !== null && setGas({ [key]: v })}
            testId={testId}
          />
        ))}
        <QuantityInput
          label="Superheat (gas warmer than air)"
          quantity="temperatureDifference"
          valueSI={gas.superheatK}
          unitSystem={units}
          minSI={L.superheatK.min}
          maxSI={L.superheatK.max}
          onCommit={(v) => v !== null && setGas({ superheatK: v })}
        />
      </div>
    </Section>
  );
}

export function TetherSection() {
  const tether = usePlanner((s) => s.draft.tether);
  const units = usePlanner((s) => s.unitSystem);
  const { setTether } = usePlannerActions();
  const current = tether ?? DEFAULT_TETHER;
  return (
    <Section title="Tether" testId="section-tether" defaultOpen={false}>
      <label className="flex items-center gap-2 text-sm">
        <input type="checkbox" checked={tether !== null} onChange={(e) => setTether(e.target.checked ? current : null)} />
        Include the tether line in the check
      </label>
      {tether && (
        <div className="mt-3 grid grid-cols-2 gap-3 sm:grid-cols-3">
          <QuantityInput
            label="Line mass"
            quantity="massPerLength"
            valueSI={tether.massPerMetreKg}
            unitSystem={units}
            minSI={L.tetherMassPerMetreKg.min}
            maxSI={L.tetherMassPerMetreKg.max}
            onCommit={(v) => v !== null && setTether({ ...tether, massPerMetreKg: v })}
          />
          <QuantityInput
            label="Line out"
            quantity="length"
            valueSI={tether.lengthOutM}
            unitSystem={units}
            minSI={L.tetherLengthOutM.min}
            maxSI={L.tetherLengthOutM.max}
            onCommit={(v) => v !== null && setTether({ ...tether, lengthOutM: v })}
            testId="tether-length-input"
          />
          <QuantityInput
            label="Breaking load"
            quantity="force"
            valueSI={tether.breakingLoadN}
            unitSystem={units}
            minSI={L.tetherBreakingLoadN.min}
            maxSI={L.tetherBreakingLoadN.max}
            onCommit={(v) => v !== null && setTether({ ...tether, breakingLoadN: v })}
          />
          <QuantityInput
            label="Line diameter (for its drag in wind)"
            quantity="smallLength"
            valueSI={tether.diameterM}
            unitSystem={units}
            minSI={L.tetherDiameterM.min}
            maxSI={L.tetherDiameterM.max}
            optional
            placeholder="no drag"
            onCommit={(v) => setTether({ ...tether, diameterM: v })}
            testId="tether-diameter-input"
          />
        </div>
      )}
    </Section>
  );
}
