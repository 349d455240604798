/**
 * `npm run bench:planner`: the Planner measured in Debian's Chromium against a production build.
 *  - edit-to-panel: from a pointer move that drags the mount to the balance panel's commit, and to
 *    the next animation frame (target ≤ 16 ms median), as the page records them with performance.measure;
 *  - edit-to-scene: from the same edit to the first frame of the 3D view that shows it (a worker
 *    draws the view; the page numbers each drawing it posts, and the worker reports the first frame
 *    showing each), and pointer-to-edit: from the pointer event to the store's edit (the page
 *    projects the pointer onto the rail itself, with the matrices the worker last reported);
 *  - the JavaScript the Planner loads on first visit with the charts brought into view (compressed
 *    as served, and uncompressed).
 * Reuses the last test build (.next-test) when TRIMRAIL_REUSE_BUILD=1.
 */
import { DEMO_PASSWORD } from "../db/seed-data";
import { startAppServer } from "../tests/support/app-server";
import { SignInPage, launchBrowser, newPersonContext } from "../tests/support/browser";
import { PlannerPage } from "../tests/support/planner-page";

const SETUP_ID = "set-tobin-draft";
const SWEEPS = 6;
const STEPS_PER_SWEEP = 40;
const SWEEP_PX = 60;

const percentile = (values: number[], p: number): number => {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.floor(sorted.length * p))];
};

const app = await startAppServer({ build: process.env.TRIMRAIL_REUSE_BUILD !== "1" });
const browser = await launchBrowser();
try {
  const context = await newPersonContext(browser, app.baseURL);
  const page = await context.newPage();
  const signIn = new SignInPage(page);
  await signIn.open(`/setups/${SETUP_ID}`);
  await signIn.signIn("tobin@trimrail.test", DEMO_PASSWORD);
  await page.waitForURL(new RegExp(`/setups/${SETUP_ID}$`));
  const planner = new PlannerPage(page);
  await planner.page.getByTestId("planner").waitFor();
  await planner.waitForScene();
  // The charts load once they come near the screen; bring them in so the drag pays for their sweeps too.
  await page.getByTestId("balance-charts-loading").scrollIntoViewIfNeeded();
  await page.getByTestId("balance-charts").waitFor();
  await page.getByTestId("lifter-canvas").scrollIntoViewIfNeeded();

  const js = await page.evaluate(() =>
    performance
      .getEntriesByType("resource")
      .filter((e) => e.name.endsWith(".js"))
      .reduce(
        (sum, e) => ({
          encoded: sum.encoded + (e as PerformanceResourceTiming).encodedBodySize,
          decoded: sum.decoded + (e as PerformanceResourceTiming).decodedBodySize,
          files: sum.files + 1,
        }),
        { encoded: 0, decoded: 0, files: 0 },
      ),
  );

  await page.evaluate(() => performance.clearMeasures());
  const start = await planner.mountScreenPoint();
  await page.mouse.move(start.x, start.y);
  await page.mouse.down();
  for (let sweep = 0; sweep < SWEEPS; sweep++) {
    const direction = sweep % 2 === 0 ? 1 : -1;
    for (let i = 1; i <= STEPS_PER_SWEEP; i++) {
      const offset = direction === 1 ? (SWEEP_PX * i) / STEPS_PER_SWEEP : SWEEP_PX - (SWEEP_PX * i) / STEPS_PER_SWEEP;
      await page.mouse.move(start.x + offset - SWEEP_PX / 2, start.y);
    }
  }
  await page.mouse.up();
  await page.waitForTimeout(300);
  const [toPanel, toFrame, toScene, pointerToDrag, thread] = await page.evaluate(() => {
    const edits = performance.getEntriesByName("trimrail:edit-to-panel");
    const draws = performance.getEntriesByName("trimrail:scene-draw") as PerformanceMark[];
    const frames = performance.getEntriesByName("trimrail:scene-frame") as PerformanceMark[];
    // Each edit: the first drawing posted after it, then the first frame that shows that drawing
    // or a later one.
    const toScene = edits.flatMap((edit) => {
      const draw = draws.find((d) => d.startTime >= edit.startTime);
      const frame = draw && frames.find((f) => (f.detail as number) >= (draw.detail as number));
      return frame ? [frame.startTime - edit.startTime] : [];
    });
    return [
      edits.map((e) => e.duration),
      performance.getEntriesByName("trimrail:edit-to-frame").map((e) => e.duration),
      toScene,
      performance.getEntriesByName("trimrail:pointer-to-drag").map((e) => e.duration),
      document.querySelector('[data-testid="lifter-canvas"]')?.getAttribute("data-thread") ?? "unknown",
    ] as const;
  });

  console.log(`planner drag: ${toPanel.length} edits measured`);
  console.log(`  edit → panel commit   median ${percentile(toPanel, 0.5).toFixed(1)} ms, p95 ${percentile(toPanel, 0.95).toFixed(1)} ms`);
  console.log(
    `  edit → next frame     median ${percentile(toFrame, 0.5).toFixed(1)} ms, p95 ${percentile(toFrame, 0.95).toFixed(1)} ms   (target ≤ 16 ms median)`,
  );
  console.log(
    toScene.length > 0
      ? `  edit → 3D view frame  median ${percentile(toScene, 0.5).toFixed(1)} ms, p95 ${percentile(toScene, 0.95).toFixed(1)} ms   (the first frame showing the edit, drawn by the ${thread})\n` +
          `  pointer → edit        median ${percentile(pointerToDrag, 0.5).toFixed(1)} ms, p95 ${percentile(pointerToDrag, 0.95).toFixed(1)} ms   (the page projects the pointer onto the rail with the frame the worker last reported)`
      : `  edit → 3D view frame  not measured: the view is drawn by the ${thread === "page" ? "page's own thread" : thread}`,
  );
  console.log(
    `planner first load: ${js.files} JS files, ${(js.encoded / 1024).toFixed(0)} KiB as served (compressed), ${(js.decoded / 1024).toFixed(0)} KiB uncompressed`,
  );
} finally {
  await browser.close();
  await app.stop();
}
