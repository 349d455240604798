import Link from "next/link";
import { notFound } from "next/navigation";
import { getUnitById, listModelChoices } from "@/db/queries/catalogue";
import { ActiveBadge, ItemActions } from "@/components/workshop/item-actions";
import { UnitEditor } from "@/components/workshop/unit-editor";
import { WorkshopNav } from "@/components/workshop/workshop-nav";
import { requirePageViewer } from "@/lib/auth/guard";
import { MAKER_ONLY } from "@/lib/domain";

export const metadata = { title: "Workshop: serial unit" };

export default async function WorkshopUnitPage({ params }: PageProps<"/workshop/units/[id]">) {
  const { id } = await params;
  const viewer = await requirePageViewer(MAKER_ONLY, `/workshop/units/${id}`);
  const [unit, models] = await Promise.all([id === "new" ? null : getUnitById({ id }), listModelChoices()]);
  if (id !== "new" && !unit) notFound();
  const initial = unit
    ? {
        serial: unit.serial,
        modelId: unit.modelId,
        ownerEmail: unit.ownerEmail ?? "",
        measuredMassKg: unit.measuredMassKg,
        notes: unit.notes,
      }
    : { serial: "", modelId: models.find((m) => m.active)?.id ?? "", ownerEmail: "", measuredMassKg: 0.5, notes: "" };
  // Newest first: the first row is the test the unit plans with.
  const tests = (unit?.tests ?? []).map((t) => ({
    id: t.id,
    measuredGrossLiftKg: t.measuredGrossLiftKg,
    temperatureC: t.temperatureC,
    pressurePa: t.pressurePa,
    altitudeM: t.altitudeM,
    purity: t.purity,
    testedOn: t.testedOn,
    createdAt: t.createdAt.toISOString(),
    notes: t.notes,
  }));
  return (
    <section className="space-y-4">
      <WorkshopNav
        current="units"
        title={unit ? `Serial unit ${unit.serial}` : "New serial unit"}
        intro={unit ? `${unit.model.name}; ${unit.setupCount} setup${unit.setupCount === 1 ? "" : "s"} name it.` : undefined}
      />
      <p className="flex flex-wrap items-center gap-3 text-sm">
        <Link href="/workshop/units" className="text-accent-dark underline">
          All units
        </Link>
        {unit && <ActiveBadge active={unit.active} />}
        {unit && (
          <ItemActions
            kind="units"
            id={unit.id}
            name={unit.serial}
            active={unit.active}
            setupCount={unit.setupCount}
            afterDelete="/workshop/units"
          />
        )}
      </p>
      <UnitEditor
        key={unit ? `${unit.id}-${tests.length}-${tests[0]?.id ?? ""}` : "new"}
        id={unit?.id ?? null}
        initial={initial}
        models={models}
        tests={tests}
        calibrationFactor={unit?.calibrationFactor ?? null}
        unitSystem={viewer.unitSystem}
      />
    </section>
  );
}
