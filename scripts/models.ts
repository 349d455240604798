/**
 * `npm run models`: writes public/models/<key>.glb for every demo hull (lib/models/envelope-glb.ts
 * builds them; the envelope GLB route builds the same from a model's stored hull).
 */
import { mkdirSync, writeFileSync } from "node:fs";
import { dirname, join } from "node:path";
import { pathToFileURL } from "node:url";
import { NodeIO } from "@gltf-transform/core";
import { demoHulls, type DemoHullName } from "../lib/balance/geometry-envelope";
import { buildEnvelopeDocument } from "../lib/models/envelope-glb";

export { BODY_FRAME_NOTE, GORE_COUNT, MODEL_RESOLUTION, buildEnvelopeDocument } from "../lib/models/envelope-glb";

export const demoModelKeys = Object.keys(demoHulls) as DemoHullName[];

export function modelPath(key: DemoHullName, root: string = process.cwd()): string {
  return join(root, "public", "models", `${key}.glb`);
}

async function main(): Promise<void> {
  const io = new NodeIO();
  for (const key of demoModelKeys) {
    const path = modelPath(key);
    mkdirSync(dirname(path), { recursive: true });
    const bytes = await io.writeBinary(buildEnvelopeDocument(key, demoHulls[key]));
    writeFileSync(path, bytes);
    process.stdout.write(`${path}  ${(bytes.byteLength / 1024).toFixed(1)} kB\n`);
  }
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  main().catch((error: unknown) => {
    process.stderr.write(`${error instanceof Error ? error.stack : String(error)}\n`);
    process.exit(1);
  });
}
