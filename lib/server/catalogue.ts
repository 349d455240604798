import "server-only";
import { createHash } from "node:crypto";
import * as catalogueDb from "@/db/queries/catalogue";
import * as writes from "@/db/queries/catalogue-writes";
import type { Viewer } from "@/lib/auth/access";
import { integrateHullProfile, type HullParams } from "@/lib/balance";
import {
  CATALOGUE_KIND_WORDS,
  WORKSHOP_PAGE_SIZE,
  type AdapterValues,
  type CatalogueKind,
  type EnvelopeModelValues,
  type EnvelopeUnitValues,
  type LiftTestValues,
  type MountValues,
  type PayloadTemplateValues,
} from "@/lib/catalogue/schemas";
import { parseTemplatesCsv, templatesToCsv, type CsvProblem } from "@/lib/catalogue/templates-csv";
import { fail, ok, type Result } from "@/lib/errors";
import { envelopeGlbBytes } from "@/lib/models/envelope-glb";
import type { FileBody } from "./route";

// The Workshop's core: one function per read a route serves and per mutation, each returning a
// Result. The maker-only rule is the route's (roles: MAKER_ONLY) and the page's (requirePageViewer).

type SimpleKind = "mounts" | "adapters" | "templates";

const notFound = (kind: CatalogueKind) => fail("not_found", `No such ${CATALOGUE_KIND_WORDS[kind].one}.`);
const taken = (kind: CatalogueKind, field: string) =>
  fail("conflict", `Another ${CATALOGUE_KIND_WORDS[kind].one} already has that ${field}.`, [
    { path: field, message: `already used by another ${CATALOGUE_KIND_WORDS[kind].one}` },
  ]);

function fromOutcome<T>(kind: CatalogueKind, outcome: writes.WriteOutcome<T>): Result<T> {
  switch (outcome.kind) {
    case "ok":
      return ok(outcome.data);
    case "not_found":
      return notFound(kind);
    case "taken":
      return taken(kind, outcome.field);
    case "in_use":
      return fail(
        "conflict",
        `${outcome.setupCount} setup${outcome.setupCount === 1 ? "" : "s"} use this ${CATALOGUE_KIND_WORDS[kind].one}: retire it instead, so those setups keep working.`,
      );
    case "has_units":
      return fail("conflict", "Serial units of this model exist: retire the model instead, or delete its units first.");
  }
}

// ---------------------------------------------------------------- reads

/** A page of any kind's rows, as the JSON list routes answer it. */
export type CataloguePage = catalogueDb.Page<object>;

export async function listCatalogue({ kind, page }: { viewer: Viewer; kind: CatalogueKind; page: number }): Promise<Result<CataloguePage>> {
  const pageSize = WORKSHOP_PAGE_SIZE;
  if (kind === "models") return ok(await catalogueDb.listModelsPage({ page, pageSize }));
  if (kind === "units") return ok(await catalogueDb.listUnitsPage({ page, pageSize }));
  return ok(await catalogueDb.listSimplePage({ kind, page, pageSize }));
}

export async function getEnvelopeModel({ id }: { viewer: Viewer; id: string }) {
  const model = await catalogueDb.getModelById({ id });
  return model ? ok(model) : notFound("models");
}

export async function getEnvelopeUnit({ id }: { viewer: Viewer; id: string }) {
  const unit = await catalogueDb.getUnitById({ id });
  return unit ? ok(unit) : notFound("units");
}

export async function getCatalogueItem<K extends SimpleKind>({ kind, id }: { viewer: Viewer; kind: K; id: string }) {
  const item = await catalogueDb.getSimpleById({ kind, id });
  return item ? ok(item) : notFound(kind);
}

// ---------------------------------------------------------------- envelope models and their GLB

/** Where an edited model's GLB is served from (the committed demo files stay in public/models). */
export const envelopeGlbRoute = (id: string) => `/api/catalogue/models/${encodeURIComponent(id)}/envelope.glb`;

function modelColumns(values: EnvelopeModelValues, glbPath: string): writes.ModelColumns {
  // Gas volume and buoyancy centre are the hull's, never typed: the same integration the engine uses.
  const integrals = integrateHullProfile(values.hull);
  return {
    slug: values.slug,
    name: values.name,
    description: values.description,
    hullJson: values.hull,
    gasVolumeM3: integrals.gasVolumeM3,
    buoyancyCentreXM: integrals.buoyancyCentre.x,
    buoyancyCentreZM: integrals.buoyancyCentre.z,
    nominalMassKg: values.nominalMassKg,
    massCentreXM: values.massCentreXM,
    massCentreZM: values.massCentreZM,
    tetherPointXM: values.tetherPointXM,
    tetherPointZM: values.tetherPointZM,
    railStartXM: values.railStartXM,
    railEndXM: values.railEndXM,
    railZM: values.railZM,
    railTabCount: values.railTabCount,
    aeroJson: values.aero,
    limitsJson: values.limits,
    glbPath,
  };
}

const sameHull = (a: HullParams, b: HullParams) => JSON.stringify(a) === JSON.stringify(b);

export async function saveEnvelopeModel({
  viewer,
  id,
  values,
}: {
  viewer: Viewer;
  id: string | null;
  values: EnvelopeModelValues;
}): Promise<Result<{ id: string }>> {
  if (id === null) {
    return fromOutcome(
      "models",
      await writes.createEnvelopeModel({ actorId: viewer.id, columns: (newId) => modelColumns(values, envelopeGlbRoute(newId)) }),
    );
  }
  // A model whose hull changed is drawn from the route; an unchanged one keeps its file.
  const outcome = await writes.updateEnvelopeModel({
    actorId: viewer.id,
    id,
    columns: (before) => modelColumns(values, sameHull(before.hullJson, values.hull) ? before.glbPath : envelopeGlbRoute(id)),
  });
  return fromOutcome("models", outcome);
}

/** Bumped when the GLB builder's output changes, so old ETags stop matching. */
const GLB_BUILDER_VERSION = "1";
const etagOfHull = (hull: HullParams): string =>
  `"${createHash("sha256").update(GLB_BUILDER_VERSION).update(JSON.stringify(hull)).digest("base64url").slice(0, 27)}"`;

/** A few recent GLBs by ETag: the same hull is asked for by every Planner that opens the model. */
const glbCache = new Map<string, Uint8Array>();
const GLB_CACHE_SIZE = 16;
async function glbOf(etag: string, name: string, hull: HullParams): Promise<Uint8Array> {
  const cached = glbCache.get(etag);
  if (cached) return cached;
  const bytes = await envelopeGlbBytes(name, hull);
  glbCache.set(etag, bytes);
  if (glbCache.size > GLB_CACHE_SIZE) glbCache.delete(glbCache.keys().next().value as string);
  return bytes;
}

function glbFile(name: string, hull: HullParams): FileBody {
  const etag = etagOfHull(hull);
  return {
    bytes: () => glbOf(etag, name, hull),
    contentType: "model/gltf-binary",
    fileName: `${name}.glb`,
    disposition: "inline",
    etag,
    cacheControl: "private, no-cache",
  };
}

/** A model's envelope as GLB, built from its stored hull: anyone signed in may draw a model. */
export async function envelopeModelGlb({ id }: { viewer: Viewer; id: string }): Promise<Result<FileBody>> {
  const model = await catalogueDb.getModelById({ id });
  return model ? ok(glbFile(model.slug, model.hullJson)) : notFound("models");
}

/** The Workshop's live preview: a GLB of hull parameters not yet saved. */
export async function hullPreviewGlb({ hull }: { viewer: Viewer; hull: HullParams }): Promise<Result<FileBody>> {
  return ok(glbFile("preview", hull));
}

// ---------------------------------------------------------------- serial units and lift tests

const today = () => new Date().toISOString().slice(0, 10);

export async function saveEnvelopeUnit({
  viewer,
  id,
  values,
}: {
  viewer: Viewer;
  id: string | null;
  values: EnvelopeUnitValues;
}): Promise<Result<{ id: string }>> {
  const outcome = await writes.saveEnvelopeUnit({ actorId: viewer.id, id, values, today: today() });
  if (outcome.kind === "bad")
    return fail("bad_request", `The unit cannot be saved: ${outcome.message}.`, [{ path: outcome.field, message: outcome.message }]);
  return fromOutcome("units", outcome);
}

export async function addUnitLiftTest({
  viewer,
  unitId,
  values,
}: {
  viewer: Viewer;
  unitId: string;
  values: LiftTestValues;
}): Promise<Result<{ id: string; calibrationFactor: number | null }>> {
  if (values.testedOn > today())
    return fail("bad_request", "A lift test cannot be dated in the future.", [{ path: "testedOn", message: "after today" }]);
  const outcome = await writes.addLiftTest({ actorId: viewer.id, unitId, values });
  if (outcome.kind !== "ok") return fromOutcome("units", outcome);
  const unit = await catalogueDb.getUnitById({ id: unitId });
  return ok({ id: outcome.data.id, calibrationFactor: unit?.calibrationFactor ?? null });
}

export async function removeUnitLiftTest({
  viewer,
  unitId,
  testId,
}: {
  viewer: Viewer;
  unitId: string;
  testId: string;
}): Promise<Result<{ id: string }>> {
  const outcome = await writes.deleteLiftTest({ actorId: viewer.id, unitId, testId });
  return outcome.kind === "not_found" ? fail("not_found", "No such lift test on this unit.") : fromOutcome("units", outcome);
}

// ---------------------------------------------------------------- mounts, adapters, templates

type ValuesOf<K extends SimpleKind> = K extends "mounts" ? MountValues : K extends "adapters" ? AdapterValues : PayloadTemplateValues;

export async function saveCatalogueItem<K extends SimpleKind>({
  viewer,
  kind,
  id,
  values,
}: {
  viewer: Viewer;
  kind: K;
  id: string | null;
  values: ValuesOf<K>;
}): Promise<Result<{ id: string }>> {
  return fromOutcome(kind, await writes.saveSimpleItem({ actorId: viewer.id, kind, id, values }));
}

export async function setCatalogueItemActive({
  viewer,
  kind,
  id,
  active,
}: {
  viewer: Viewer;
  kind: CatalogueKind;
  id: string;
  active: boolean;
}): Promise<Result<{ id: string; active: boolean }>> {
  return fromOutcome(kind, await writes.setCatalogueItemActive({ actorId: viewer.id, kind, id, active }));
}

export async function deleteCatalogueItem({
  viewer,
  kind,
  id,
}: {
  viewer: Viewer;
  kind: CatalogueKind;
  id: string;
}): Promise<Result<{ id: string }>> {
  return fromOutcome(kind, await writes.deleteCatalogueItem({ actorId: viewer.id, kind, id }));
}

// ---------------------------------------------------------------- templates as CSV

export async function exportTemplatesCsv(_: { viewer: Viewer }): Promise<Result<FileBody>> {
  const rows = await catalogueDb.listAllPayloadTemplates();
  const bytes = new TextEncoder().encode(templatesToCsv(rows));
  return ok({ bytes, contentType: "text/csv; charset=utf-8", fileName: "payload-templates.csv", disposition: "attachment" });
}

/** Imports every row or none: any bad row is a 422 naming each row, column and problem, and nothing is written. */
export async function importTemplatesCsv({
  viewer,
  csv,
}: {
  viewer: Viewer;
  csv: string;
}): Promise<Result<{ created: number; updated: number }>> {
  const parsed = parseTemplatesCsv(csv);
  const refuse = (problems: CsvProblem[]): Result<never> => ({
    ok: false,
    error: {
      code: "unprocessable",
      message: `Nothing was imported: ${problems.length} problem${problems.length === 1 ? "" : "s"} in the file.`,
      issues: problems.map((p) => ({ path: `row ${p.row}.${p.field}`, message: p.problem })),
      detail: { problems },
    },
  });
  if (!parsed.ok) return refuse(parsed.problems);
  const outcome = await writes.importPayloadTemplates({ actorId: viewer.id, rows: parsed.rows });
  if (outcome.kind === "conflict") return refuse([{ row: outcome.row, field: outcome.field, problem: outcome.message }]);
  return ok({ created: outcome.created, updated: outcome.updated });
}
