import { startAppServer } from "./support/app-server";
import { ApiClient } from "./support/http";
import { streamUpload, uploadFile } from "./support/attachments-api";
import { jpegWithGps, oversizedJpegLike } from "./support/attachment-files";

const app = await startAppServer({ build: false });
const MB = 1024 * 1024;
try {
  const c = new ApiClient(app.baseURL);
  await c.signIn("customer@trimrail.test");
  const start = await jpegWithGps();
  let t0 = Date.now();
  const r = await uploadFile(c, "set-wren-whip", { bytes: oversizedJpegLike(11 * MB, start), name: "huge.jpg" });
  console.log("RESULT fetch", Date.now() - t0, r.status);
  for (const size of [11, 200, 200]) {
    t0 = Date.now();
    const o = await streamUpload(app.baseURL, c.cookieHeader(), "set-wren-whip", { fileBytes: size * MB, start });
    console.log("RESULT", size, Date.now() - t0, "ms", o.status, o.sentBytes, o.error);
  }
} finally {
  await app.stop();
}
