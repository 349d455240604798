"use client";
import { DEFAULT_TETHER, DEFAULT_WIND_MEASUREMENT, INPUT_LIMITS as L, MAX_NAME_LENGTH } from "@/lib/domain";
import { usePlanner, usePlannerActions } from "./planner-context";
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
        <label className="block text-sm text-muted">
          Power of height
          <input
            type="number"
            step="0.01"
            min={L.windShearExponent.min}
            max={L.windShearExponent.max}
            defaultValue={Number(site.windShearExponent.toFixed(3))}
            data-testid="wind-shear-input"
            className="figure mt-0.5 w-24 rounded border border-hairline bg-white px-2 py-1"
            onBlur={(e) => {
              const v = Number(e.target.value);
              if (Number.isFinite(v) && v >= L.windShearExponent.min && v <= L.windShearExponent.max) setSite({ windShearExponent: v });
              else e.target.value = String(Number(site.windShearExponent.toFixed(3)));
            }}
          />
        </label>
      )}
    </>
  );
}

/** Relative humidity in percent; empty is dry air (humid air is lighter and lifts less). */
function HumidityInput() {
  const humidity = usePlanner((s) => s.draft.site.relativeHumidity);
  const { setSite } = usePlannerActions();
  const shown = humidity === null ? "" : String(Number((humidity * 100).toFixed(1)));
  return (
    <label className="block text-sm text-muted">
      Relative humidity
      <span className="mt-0.5 flex items-center gap-1">
        <input
          type="number"
          step="1"
          min={0}
          max={100}
          placeholder="dry"
          key={shown}
          defaultValue={shown}
          data-testid="humidity-input"
          className="figure w-24 rounded border border-hairline bg-white px-2 py-1"
          onBlur={(e) => {
            const raw = e.target.value.trim();
            if (raw === "") return setSite({ relativeHumidity: null });
            const v = Number(raw);
            if (Number.isFinite(v) && v >= 0 && v <= 100) setSite({ relativeHumidity: v / 100 });
            else e.target.value = shown;
          }}
        />
        <span className="unit">%</span>
      </span>
    </label>
  );
}

export function SiteSection() {
  const site = usePlanner((s) => s.draft.site);
  const units = usePlanner((s) => s.unitSystem);
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
            onBlur={(e) => setSite({ siteName: e.target.value.trim() })}
          />
        </label>
        <QuantityInput
          label="Altitude above sea level"
          quantity="length"
          valueSI={site.altitudeM}
          unitSystem={units}
          minSI={L.altitudeM.min}
          maxSI={L.altitudeM.max}
          onCommit={(v) => v !== null && setSite({ altitudeM: v })}
          testId="altitude-input"
        />
        <QuantityInput
          label="Air temperature"
          quantity="temperature"
          valueSI={site.temperatureC}
          unitSystem={units}
          minSI={L.temperatureC.min}
          maxSI={L.temperatureC.max}
          optional
          placeholder="standard"
          onCommit={(v) => setSite({ temperatureC: v })}
          testId="temperature-input"
        />
        <QuantityInput
          label="Wind"
          quantity="speed"
          valueSI={site.windMS}
          unitSystem={units}
          minSI={L.windMS.min}
          maxSI={L.windMS.max}
          onCommit={(v) => v !== null && setSite({ windMS: v })}
          testId="wind-input"
        />
        <QuantityInput
          label="Gusts"
          quantity="speed"
          valueSI={site.gustMS}
          unitSystem={units}
          minSI={L.gustMS.min}
          maxSI={L.gustMS.max}
          optional
          placeholder="none"
          onCommit={(v) => setSite({ gustMS: v })}
          testId="gust-input"
        />
        <WindMeasurement />
        <HumidityInput />
      </div>
    </Section>
  );
}

export function GasSection() {
  const gas = usePlanner((s) => s.draft.gas);
  const units = usePlanner((s) => s.unitSystem);
  const { setGas } = usePlannerActions();
  const percentField = (label: string, value: number, min: number, key: "purity" | "fillFraction", testId: string) => (
    <label className="block text-sm text-muted">
      {label}
      <span className="mt-0.5 flex items-center gap-1">
        <input
          type="number"
          step="0.5"
          min={min * 100}
          max={100}
          defaultValue={Number((value * 100).toFixed(1))}
          data-testid={testId}
          className="figure w-24 rounded border border-hairline bg-white px-2 py-1"
          onBlur={(e) => {
            const v = Number(e.target.value);
            if (Number.isFinite(v) && v >= min * 100 && v <= 100) setGas({ [key]: v / 100 });
            else e.target.value = String(Number((value * 100).toFixed(1)));
          }}
        />
        <span className="unit">%</span>
      </span>
    </label>
  );
  return (
    <Section title="Gas" testId="section-gas" defaultOpen={false}>
      <div className="grid grid-cols-2 gap-3 sm:grid-cols-3">
        {percentField("Helium purity (rest is air)", gas.purity, L.purity.min, "purity", "purity-input")}
        {percentField("Fill", gas.fillFraction, L.fillFraction.min, "fillFraction", "fill-input")}
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
