import { createRequire } from "node:module";

const require = createRequire(import.meta.url);

/**
 * The command that runs Next's own CLI with this Node, e.g. `spawn(...nextCommand(["start"]))`.
 * Not `npx next`: npx stays resident as a parent of the server (about 75 MB here) and would be
 * counted in every measure of the server's memory, which a deployment running `next start` has not.
 */
export function nextCommand(args: string[]): [string, string[]] {
  return [process.execPath, [require.resolve("next/dist/bin/next"), ...args]];
}
