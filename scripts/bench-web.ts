/**
 * `npm run bench:web`: Lighthouse (mobile simulation, performance only) against a production build
 * on four pages: the landing page, sign-in, Setups and the Planner (signed in as a demo customer).
 * Per page it prints the score, LCP, TBT and the JavaScript loaded, compressed as served and
 * decoded; "first" is the JS the HTML asks for (what the page needs to paint and hydrate), "later"
 * what dynamic imports fetch after it (the 3D view, the charts). A page that loads three.js is
 * measured a second time with those chunks refused, to tell the 3D view's cost from the rest. The 3D
 * view's own scripts load in its worker (Lighthouse calls them "Other"); they count as JS loaded
 * later. Before measuring the Planner, the bench checks in the same browser that the 3D view is
 * drawn, and by which thread.
 * Reuses the last test build (.next-test) when TRIMRAIL_REUSE_BUILD=1; TRIMRAIL_BENCH_RUNS sets the
 * runs per page (median by score, default 3: one run on a shared machine is noisy) and
 * TRIMRAIL_BENCH_PAGES a comma-separated subset of the pages (landing, sign-in, setups, planner). The median
 * run's full report is kept in test-output/bench-web/<page>.json for a closer look.
 */
import { spawn, type ChildProcess } from "node:child_process";
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import lighthouse from "lighthouse";
import { chromium } from "playwright-core";
import { DEMO_PASSWORD } from "../db/seed-data";
import { startAppServer } from "../tests/support/app-server";
import { CHROMIUM_ARGS, CHROMIUM_PATH } from "../tests/support/browser";

interface PageToMeasure {
  label: string;
  path: string;
  signedIn: boolean;
  /** Has a 3D view, checked to draw before it is measured. */
  hasScene?: boolean;
}

const ALL_PAGES: PageToMeasure[] = [
  { label: "landing", path: "/", signedIn: false },
  { label: "sign-in", path: "/sign-in", signedIn: false },
  { label: "setups", path: "/setups", signedIn: true },
  { label: "planner", path: "/setups/set-tobin-draft", signedIn: true, hasScene: true },
];
// TRIMRAIL_BENCH_PAGES=planner,landing measures only those.
const chosen = process.env.TRIMRAIL_BENCH_PAGES?.split(",").map((label) => label.trim());
const PAGES = chosen ? ALL_PAGES.filter((page) => chosen.includes(page.label)) : ALL_PAGES;
const PERSON = "tobin@trimrail.test";
const RUNS = Math.max(1, Number(process.env.TRIMRAIL_BENCH_RUNS ?? 3));
const REPORT_DIR = path.join(process.cwd(), "test-output", "bench-web");

// Strings that survive minification: three.js names its renderer in its warnings, Recharts its
// CSS classes. They tell whether a chunk carries either library.
const LIBRARY_MARKERS = { three: "THREE.WebGLRenderer", recharts: "recharts-wrapper" } as const;

interface JsBytes {
  transferBytes: number;
  decodedBytes: number;
  files: number;
}

interface PageFigures {
  score: number;
  lcpMs: number;
  tbtMs: number;
  first: JsBytes;
  later: JsBytes;
  libsInFirst: string[];
  /** Scripts the page loaded after its first load that carry three.js: the 3D view, when the page draws it. */
  sceneUrls: string[];
  /** Lighthouse's measure of this machine's speed at the time (higher is faster). */
  benchmarkIndex: number;
  report: string;
}

interface NetworkItem {
  url: string;
  resourceType?: string;
  transferSize?: number;
  resourceSize?: number;
}

async function launchDebuggableChromium(): Promise<{ port: number; child: ChildProcess; dir: string }> {
  const dir = mkdtempSync(path.join(os.tmpdir(), "trimrail-lh-"));
  const child = spawn(CHROMIUM_PATH, [...CHROMIUM_ARGS, "--remote-debugging-port=0", `--user-data-dir=${dir}`, "about:blank"], {
    stdio: ["ignore", "ignore", "pipe"],
  });
  const port = await new Promise<number>((resolve, reject) => {
    let seen = "";
    const timer = setTimeout(() => reject(new Error(`chromium did not open a debugging port:\n${seen}`)), 30_000);
    child.stderr?.on("data", (chunk: Buffer) => {
      seen += chunk.toString();
      const match = /DevTools listening on ws:\/\/[^:]+:(\d+)\//.exec(seen);
      if (match) {
        clearTimeout(timer);
        resolve(Number(match[1]));
      }
    });
    child.once("exit", (code) => reject(new Error(`chromium exited with ${code}:\n${seen}`)));
  });
  return { port, child, dir };
}

async function signInCookie(baseURL: string): Promise<string> {
  const response = await fetch(new URL("/api/auth/sign-in/email", baseURL), {
    method: "POST",
    headers: { "content-type": "application/json", origin: baseURL },
    body: JSON.stringify({ email: PERSON, password: DEMO_PASSWORD }),
  });
  if (!response.ok) throw new Error(`sign-in as ${PERSON} answered ${response.status}`);
  return response.headers
    .getSetCookie()
    .map((line) => line.split(";")[0])
    .join("; ");
}

/** The script URLs the server's HTML names (script tags and preloads): the page's first load. */
async function scriptsInHtml(url: string, cookie: string | undefined): Promise<Set<string>> {
  const html = await (await fetch(url, { headers: cookie ? { cookie } : {} })).text();
  const found = new Set<string>();
  for (const match of html.matchAll(/(?:src|href)="([^"]+\.js[^"]*)"/g)) found.add(new URL(match[1].replaceAll("&amp;", "&"), url).href);
  return found;
}

/** Which of the heavy libraries each script carries, by URL. */
async function librariesIn(urls: string[]): Promise<Map<string, string[]>> {
  const found = new Map<string, string[]>();
  for (const url of urls) {
    const text = await (await fetch(url)).text();
    found.set(
      url,
      Object.entries(LIBRARY_MARKERS)
        .filter(([, marker]) => text.includes(marker))
        .map(([name]) => name),
    );
  }
  return found;
}

const sumJs = (items: NetworkItem[]): JsBytes => ({
  transferBytes: items.reduce((sum, i) => sum + (i.transferSize ?? 0), 0),
  decodedBytes: items.reduce((sum, i) => sum + (i.resourceSize ?? 0), 0),
  files: items.length,
});

interface RunOptions {
  port: number;
  cookie: string;
  /** Script URLs Lighthouse refuses to load (the 3D view's chunks, to see the page without it). */
  blocked?: string[];
}

async function measure(baseURL: string, page: PageToMeasure, { port, cookie, blocked = [] }: RunOptions): Promise<PageFigures> {
  const url = new URL(page.path, baseURL).href;
  const headers = page.signedIn ? { cookie } : undefined;
  const result = await lighthouse(url, {
    port,
    hostname: "127.0.0.1",
    output: "json",
    logLevel: "error",
    onlyCategories: ["performance"],
    extraHeaders: headers,
    blockedUrlPatterns: blocked,
  });
  if (!result) throw new Error(`lighthouse returned nothing for ${url}`);
  const { lhr } = result;
  if (lhr.runtimeError) throw new Error(`lighthouse on ${url}: ${lhr.runtimeError.message}`);
  // Scripts of the page and of its workers (which Lighthouse files as "Other").
  const items = ((lhr.audits["network-requests"]?.details as { items?: NetworkItem[] } | undefined)?.items ?? []).filter(
    (i) => i.resourceType === "Script" || (i.resourceType === "Other" && new URL(i.url).pathname.endsWith(".js")),
  );
  const firstUrls = await scriptsInHtml(url, headers?.cookie);
  const first = items.filter((i) => firstUrls.has(i.url));
  const later = items.filter((i) => !firstUrls.has(i.url) && (i.transferSize ?? 0) > 0);
  const libraries = await librariesIn(items.map((i) => i.url));
  return {
    score: lhr.categories.performance?.score ?? 0,
    lcpMs: lhr.audits["largest-contentful-paint"]?.numericValue ?? Number.NaN,
    tbtMs: lhr.audits["total-blocking-time"]?.numericValue ?? Number.NaN,
    first: sumJs(first),
    later: sumJs(later),
    libsInFirst: [...new Set(first.flatMap((i) => libraries.get(i.url) ?? []))],
    // Only the page's own scripts: Lighthouse cannot refuse a worker's, and there three.js is off the page's thread.
    sceneUrls: later.filter((i) => i.resourceType === "Script" && libraries.get(i.url)?.includes("three")).map((i) => i.url),
    benchmarkIndex: lhr.environment.benchmarkIndex,
    report: JSON.stringify(lhr),
  };
}

const kib = (bytes: number): string => `${(bytes / 1024).toFixed(0)} KiB`;

function printRow(label: string, f: PageFigures): void {
  const all = f.first.transferBytes + f.later.transferBytes;
  const allDecoded = f.first.decodedBytes + f.later.decodedBytes;
  console.log(
    [
      label.padEnd(15),
      f.score.toFixed(2).padStart(5),
      `${(f.lcpMs / 1000).toFixed(2)} s`.padStart(8),
      `${f.tbtMs.toFixed(0)} ms`.padStart(8),
      `${kib(all)} / ${kib(allDecoded)}`.padStart(20),
      `${kib(f.first.transferBytes)} / ${kib(f.first.decodedBytes)} (${f.first.files})`.padStart(24),
      `${kib(f.later.transferBytes)} (${f.later.files})`.padStart(14),
      `  ${f.libsInFirst.length ? f.libsInFirst.join(", ") : "none"}`,
    ].join(" "),
  );
}

/**
 * Lighthouse now and then fails to record a trace (NO_NAVSTART) and asks to be run again: a run
 * that fails so is tried again, twice at most; any other failure stops the bench.
 */
async function measureWithRetry(baseURL: string, page: PageToMeasure, options: RunOptions): Promise<PageFigures> {
  for (let attempt = 1; ; attempt++) {
    try {
      return await measure(baseURL, page, options);
    } catch (error) {
      if (attempt >= 3 || !String(error).includes("run Lighthouse again")) throw error;
      console.warn(`[bench:web] ${page.label}: ${String(error)}; trying again`);
    }
  }
}

async function medianOf(baseURL: string, page: PageToMeasure, options: RunOptions, reportName: string): Promise<PageFigures> {
  const runs: PageFigures[] = [];
  for (let i = 0; i < RUNS; i++) runs.push(await measureWithRetry(baseURL, page, options));
  runs.sort((a, b) => a.score - b.score);
  const median = runs[Math.floor(runs.length / 2)];
  mkdirSync(REPORT_DIR, { recursive: true });
  writeFileSync(path.join(REPORT_DIR, `${reportName}.json`), median.report);
  return median;
}

/** Opens the page in the bench's browser and waits for its 3D view to draw: "worker" or "page". */
async function sceneDrawnBy(port: number, url: string, cookie: string): Promise<string> {
  const browser = await chromium.connectOverCDP(`http://127.0.0.1:${port}`);
  try {
    const context = await browser.newContext();
    await context.addCookies(
      cookie.split("; ").map((pair) => {
        const [name, ...value] = pair.split("=");
        return { name, value: value.join("="), url };
      }),
    );
    const tab = await context.newPage();
    await tab.goto(url);
    const view = tab.locator('[data-testid="lifter-canvas"][data-ready="true"]');
    await view.waitFor({ timeout: 60_000 });
    const thread = (await view.getAttribute("data-thread")) ?? "unknown";
    await context.close();
    return thread;
  } finally {
    await browser.close();
  }
}

const app = await startAppServer({ build: process.env.TRIMRAIL_REUSE_BUILD !== "1" });
const bench = await launchDebuggableChromium();
try {
  const cookie = await signInCookie(app.baseURL);
  const rows: [string, PageFigures][] = [];
  for (const page of PAGES) {
    // The first visit warms the server's caches and finds the 3D view's chunks; it is not counted.
    const warm = await measure(app.baseURL, page, { port: bench.port, cookie });
    if (page.hasScene) {
      const thread = await sceneDrawnBy(bench.port, new URL(page.path, app.baseURL).href, cookie);
      console.log(`[bench:web] ${page.label}: the 3D view draws (drawn by the ${thread === "worker" ? "worker" : "page's main thread"})`);
    }
    rows.push([page.label, await medianOf(app.baseURL, page, { port: bench.port, cookie }, page.label)]);
    if (warm.sceneUrls.length > 0) {
      // The same page with the 3D view's chunks refused (it shows its text fallback): what the rest costs.
      const options = { port: bench.port, cookie, blocked: warm.sceneUrls };
      rows.push([`${page.label} w/o 3D`, await medianOf(app.baseURL, page, options, `${page.label}-without-3d`)]);
    }
  }
  const speeds = rows.map(([, f]) => f.benchmarkIndex.toFixed(0)).join(", ");
  console.log(
    `\nLighthouse ${RUNS} run(s) per page (median by score), mobile simulation, performance only; JS as gzip transferred / decoded.`,
  );
  console.log(
    `Machine: load average ${os.loadavg()[0].toFixed(1)} on ${os.cpus().length} cores; Lighthouse benchmarkIndex per row ${speeds}.`,
  );
  console.log(
    "page            score      LCP      TBT     all JS (gz / raw)   first load (gz / raw, files)   later (files)  heavy libs in first load",
  );
  for (const [label, figures] of rows) printRow(label, figures);
} finally {
  // Chromium writes to its profile until it has exited; remove the folder after that.
  const exited = new Promise((resolve) => bench.child.once("exit", resolve));
  bench.child.kill("SIGTERM");
  await exited;
  await app.stop();
  rmSync(bench.dir, { recursive: true, force: true });
}
