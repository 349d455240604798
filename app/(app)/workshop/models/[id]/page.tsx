import Link from "next/link";
import { notFound } from "next/navigation";
import { getModelById } from "@/db/queries/catalogue";
import { ActiveBadge, ItemActions } from "@/components/workshop/item-actions";
import { ModelEditor } from "@/components/workshop/model-editor";
import { suggestedRigging } from "@/components/workshop/model-fields";
import { WorkshopNav } from "@/components/workshop/workshop-nav";
import { requirePageViewer } from "@/lib/auth/guard";
import { demoHulls } from "@/lib/balance";
import type { EnvelopeModelValues } from "@/lib/catalogue/schemas";
import { MAKER_ONLY } from "@/lib/domain";

export const metadata = { title: "Workshop: envelope model" };

/** A new model starts from the middle demo hull and the rigging it suggests; the maker edits from there. */
function newModelValues(): EnvelopeModelValues {
  const hull = { ...demoHulls["ridge-11"], fins: { ...demoHulls["ridge-11"].fins } };
  return { slug: "", name: "", description: "", hull, nominalMassKg: 0.5, railTabCount: 9, limits: {}, ...suggestedRigging(hull) };
}

export default async function WorkshopModelPage({ params }: PageProps<"/workshop/models/[id]">) {
  const { id } = await params;
  const viewer = await requirePageViewer(MAKER_ONLY, `/workshop/models/${id}`);
  const model = id === "new" ? null : await getModelById({ id });
  if (id !== "new" && !model) notFound();
  const initial: EnvelopeModelValues = model
    ? {
        slug: model.slug,
        name: model.name,
        description: model.description,
        hull: model.hullJson,
        nominalMassKg: model.nominalMassKg,
        massCentreXM: model.massCentreXM,
        massCentreZM: model.massCentreZM,
        tetherPointXM: model.tetherPointXM,
        tetherPointZM: model.tetherPointZM,
        railStartXM: model.railStartXM,
        railEndXM: model.railEndXM,
        railZM: model.railZM,
        railTabCount: model.railTabCount,
        aero: model.aeroJson ?? suggestedRigging(model.hullJson).aero,
        limits: model.limitsJson,
      }
    : newModelValues();
  return (
    <section className="space-y-4">
      <WorkshopNav current="models" title={model ? model.name : "New envelope model"} />
      <p className="flex flex-wrap items-center gap-3 text-sm">
        <Link href="/workshop" className="text-accent-dark underline">
          All models
        </Link>
        {model && <ActiveBadge active={model.active} />}
        {model && (
          <ItemActions
            kind="models"
            id={model.id}
            name={model.name}
            active={model.active}
            setupCount={model.setupCount}
            afterDelete="/workshop"
          />
        )}
      </p>
      <ModelEditor
        key={model ? `${model.id}-${model.updatedAt.getTime()}` : "new"}
        id={model?.id ?? null}
        initial={initial}
        unitSystem={viewer.unitSystem}
        setupCount={model?.setupCount ?? 0}
      />
    </section>
  );
}
