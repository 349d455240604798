"use client";
import { useMutation } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm, type FieldValues } from "react-hook-form";
import { FlagBadge } from "@/components/ui/flag-badge";
import { CALIBRATION_FACTOR_RANGE, calibrationOutOfRange } from "@/lib/balance";
import { envelopeUnitValuesSchema, liftTestValuesSchema, type EnvelopeUnitValues, type LiftTestValues } from "@/lib/catalogue/schemas";
import { ApiError, addLiftTestRequest, deleteLiftTestRequest, saveCatalogueItemRequest } from "@/lib/client/api";
import type { UnitSystem } from "@/lib/domain";
import { unitCalibrationFactor, type LiftTestFacts } from "@/lib/setups/calibration";
import { formatQuantity } from "@/lib/units";
import { applyServerIssues, NumberField, SelectField, TextField } from "./form-fields";
import { siResolver, toFormValues, type NumberFieldSpec } from "./si-form";
import { WorkshopTable } from "./workshop-table";

export interface UnitLiftTestView extends LiftTestFacts {
  id: string;
  notes: string;
}

interface UnitEditorProps {
  id: string | null;
  initial: EnvelopeUnitValues;
  models: { id: string; name: string; active: boolean; gasVolumeM3: number }[];
  tests: UnitLiftTestView[];
  calibrationFactor: number | null;
  unitSystem: UnitSystem;
}

const UNIT_FIELDS: readonly NumberFieldSpec[] = [{ path: "measuredMassKg", quantity: "mass" }];
const TEST_FIELDS = [
  { path: "measuredGrossLiftKg", quantity: "mass", label: "Measured gross lift (at full fill)", testId: "test-gross-lift" },
  { path: "temperatureC", quantity: "temperature", label: "Air temperature", testId: "test-temperature" },
  {
    path: "pressurePa",
    quantity: "pressure",
    label: "Station pressure (empty: ISA at the altitude)",
    empty: "null",
    testId: "test-pressure",
  },
  { path: "altitudeM", quantity: "distance", label: "Altitude", testId: "test-altitude" },
  { path: "purity", quantity: "ratio", label: "Helium purity", testId: "test-purity" },
] as const satisfies readonly (NumberFieldSpec & { label: string; testId: string })[];

/** The factor with its flag for the maker: a caution outside 0.85–1.15 (common practice). */
export function FactorText({ factor, testId }: { factor: number | null; testId?: string }) {
  if (factor === null)
    return (
      <span data-testid={testId} data-factor="">
        not tested
      </span>
    );
  const out = calibrationOutOfRange(factor);
  return (
    <span className="inline-flex items-center gap-1" data-testid={testId} data-factor={factor.toFixed(4)} data-out-of-range={out}>
      <span className="figure">×{factor.toFixed(3)}</span>
      {out && (
        <FlagBadge level="caution" label={`outside ${CALIBRATION_FACTOR_RANGE.min}–${CALIBRATION_FACTOR_RANGE.max}: check the unit`} />
      )}
    </span>
  );
}

function LiftTests({
  unitId,
  tests,
  modelVolumeM3,
  unitSystem,
}: {
  unitId: string;
  tests: UnitLiftTestView[];
  modelVolumeM3: number;
  unitSystem: UnitSystem;
}) {
  const router = useRouter();
  const today = new Date().toISOString().slice(0, 10);
  const blank: LiftTestValues = {
    measuredGrossLiftKg: Number.NaN,
    temperatureC: 15,
    pressurePa: null,
    altitudeM: 0,
    purity: 1,
    testedOn: today,
    notes: "",
  };
  const form = useForm<FieldValues>({
    resolver: siResolver(liftTestValuesSchema, TEST_FIELDS, unitSystem),
    defaultValues: toFormValues(blank, TEST_FIELDS, unitSystem),
  });
  const [message, setMessage] = useState<string | null>(null);
  const add = useMutation({
    mutationFn: (values: LiftTestValues) => addLiftTestRequest(unitId, values),
    onSuccess: ({ calibrationFactor }) => {
      setMessage(
        calibrationFactor === null
          ? "Recorded."
          : `Recorded: the unit now plans with ×${calibrationFactor.toFixed(3)} of its model's volume.`,
      );
      form.reset(toFormValues(blank, TEST_FIELDS, unitSystem));
      router.refresh();
    },
    onError: (error) =>
      setMessage(
        [
          error.message,
          ...applyServerIssues(
            error instanceof ApiError ? error.error.issues : [],
            (p, e) => form.setError(p, e),
            () => true,
          ),
        ].join(" "),
      ),
  });
  const remove = useMutation({ mutationFn: (testId: string) => deleteLiftTestRequest(unitId, testId), onSuccess: () => router.refresh() });
  const cell = "border-t border-hairline px-3 py-2";
  return (
    <div className="space-y-3">
      <h2 className="text-lg">Lift tests</h2>
      <WorkshopTable testId="lift-tests">
        <thead className="text-left text-muted">
          <tr>
            <th className="px-3 py-2">Date</th>
            <th className="px-3 py-2">Gross lift</th>
            <th className="px-3 py-2">Air</th>
            <th className="px-3 py-2">Purity</th>
            <th className="px-3 py-2">Factor</th>
            <th className="px-3 py-2">Notes</th>
            <th className="px-3 py-2">
              <span className="sr-only">Actions</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {tests.map((t, i) => (
            <tr key={t.id} data-testid="lift-test-row">
              <td className={`${cell} figure`}>
                {t.testedOn}
                {i === 0 && <span className="ml-1 text-muted">(used)</span>}
              </td>
              <td className={`${cell} figure`}>{formatQuantity("mass", t.measuredGrossLiftKg, unitSystem)}</td>
              <td className={`${cell} figure`}>
                {formatQuantity("temperature", t.temperatureC, unitSystem)},{" "}
                {t.pressurePa === null
                  ? `ISA at ${formatQuantity("distance", t.altitudeM, unitSystem)}`
                  : formatQuantity("pressure", t.pressurePa, unitSystem)}
              </td>
              <td className={`${cell} figure`}>{formatQuantity("ratio", t.purity, unitSystem)}</td>
              <td className={cell}>
                <FactorText factor={unitCalibrationFactor(modelVolumeM3, t)} />
              </td>
              <td className={cell}>{t.notes}</td>
              <td className={cell}>
                <button
                  type="button"
                  className="text-flag-stop underline"
                  onClick={() => window.confirm(`Remove the lift test of ${t.testedOn}?`) && remove.mutate(t.id)}
                  aria-label={`Remove the lift test of ${t.testedOn}`}
                >
                  Remove
                </button>
              </td>
            </tr>
          ))}
          {tests.length === 0 && (
            <tr>
              <td className={cell} colSpan={7}>
                No lift test yet: setups plan with the model&apos;s drawn volume.
              </td>
            </tr>
          )}
        </tbody>
      </WorkshopTable>
      <form
        onSubmit={form.handleSubmit((v) => add.mutate(v as LiftTestValues))}
        noValidate
        className="panel grid gap-3 p-4 sm:grid-cols-3"
        data-testid="lift-test-form"
      >
        <h3 className="font-display font-bold sm:col-span-3">Record a lift test</h3>
        {TEST_FIELDS.map((f) => (
          <NumberField key={f.path} {...f} unitSystem={unitSystem} register={form.register} errors={form.formState.errors} />
        ))}
        <div className="text-sm">
          <label htmlFor="lift-test-date" className="block text-muted">
            Date
          </label>
          <input
            id="lift-test-date"
            type="date"
            {...form.register("testedOn")}
            className="mt-0.5 rounded border border-hairline bg-white px-2 py-1"
            data-testid="test-date"
          />
        </div>
        <TextField path="notes" label="Notes" register={form.register} errors={form.formState.errors} className="sm:col-span-3" />
        <div className="flex items-center gap-3 sm:col-span-3">
          <button
            type="submit"
            disabled={add.isPending}
            className="rounded bg-accent px-3 py-1.5 text-sm text-white"
            data-testid="lift-test-save"
          >
            Record the test
          </button>
          {message && (
            <p className="text-sm" role="status" data-testid="lift-test-message">
              {message}
            </p>
          )}
        </div>
      </form>
    </div>
  );
}

/** A serial unit: what it is and who owns it, its weighed mass, and its lift tests with the calibration they give. */
export function UnitEditor({ id, initial, models, tests, calibrationFactor, unitSystem }: UnitEditorProps) {
  const router = useRouter();
  const form = useForm<FieldValues>({
    resolver: siResolver(envelopeUnitValuesSchema, UNIT_FIELDS, unitSystem),
    defaultValues: toFormValues(initial, UNIT_FIELDS, unitSystem),
  });
  const [message, setMessage] = useState<string | null>(null);
  const save = useMutation({
    mutationFn: (values: EnvelopeUnitValues) => saveCatalogueItemRequest("units", id, values),
    onSuccess: ({ id: savedId }) => {
      setMessage("Saved.");
      if (id === null) router.push(`/workshop/units/${savedId}`);
      else router.refresh();
    },
    onError: (error) =>
      setMessage(
        [
          error.message,
          ...applyServerIssues(
            error instanceof ApiError ? error.error.issues : [],
            (p, e) => form.setError(p, e),
            () => true,
          ),
        ].join(" "),
      ),
  });
  const model = models.find((m) => m.id === initial.modelId);
  return (
    <div className="space-y-6">
      {id !== null && (
        <p className="panel px-4 py-2 text-sm">
          Calibration factor <FactorText factor={calibrationFactor} testId="unit-factor" />{" "}
          <span className="text-muted">
            (measured ÷ predicted gross lift of its model at the latest test; setups that name this unit plan with the model&apos;s volume
            times this factor)
          </span>
        </p>
      )}
      <form
        onSubmit={form.handleSubmit((v) => save.mutate(v as EnvelopeUnitValues))}
        noValidate
        className="panel grid gap-3 p-4 sm:grid-cols-2"
        data-testid="unit-form"
      >
        <TextField path="serial" label="Serial" register={form.register} errors={form.formState.errors} testId="unit-serial" />
        <SelectField
          path="modelId"
          label="Envelope model"
          register={form.register}
          errors={form.formState.errors}
          options={models
            .filter((m) => m.active || m.id === initial.modelId)
            .map((m) => ({ value: m.id, label: m.active ? m.name : `${m.name} (retired)` }))}
        />
        <TextField
          path="ownerEmail"
          label="Owner (a customer's e-mail; empty: the workshop's own)"
          register={form.register}
          errors={form.formState.errors}
          testId="unit-owner"
        />
        <NumberField
          path="measuredMassKg"
          quantity="mass"
          label="Weighed mass"
          unitSystem={unitSystem}
          register={form.register}
          errors={form.formState.errors}
          testId="unit-mass"
        />
        <TextField path="notes" label="Notes" register={form.register} errors={form.formState.errors} multiline className="sm:col-span-2" />
        <div className="flex items-center gap-3 sm:col-span-2">
          <button
            type="submit"
            disabled={save.isPending}
            className="rounded bg-accent px-3 py-1.5 text-sm text-white"
            data-testid="unit-save"
          >
            {id === null ? "Add the unit" : "Save the unit"}
          </button>
          {message && (
            <p className="text-sm" role="status">
              {message}
            </p>
          )}
        </div>
      </form>
      {id !== null && model && <LiftTests unitId={id} tests={tests} modelVolumeM3={model.gasVolumeM3} unitSystem={unitSystem} />}
    </div>
  );
}
