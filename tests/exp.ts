import http from "node:http";
import sharp from "sharp";
import { startAppServer } from "./support/app-server";
import { ApiClient } from "./support/http";

const app = await startAppServer({ build: false });
try {
  const c = new ApiClient(app.baseURL);
  console.log("signin", (await c.signIn("customer@trimrail.test")).status);
  const jpeg = await sharp({ create: { width: 64, height: 48, channels: 3, background: "#1d7f7a" } }).jpeg().withExif({ IFD0: { Make: "X" } }).toBuffer();
  const form = new FormData();
  form.append("file", new Blob([jpeg], { type: "image/jpeg" }), "photo.jpg");
  const cookie = (c as unknown as { cookies: Map<string, string> }).cookies;
  const cookieHeader = [...cookie].map(([k, v]) => `${k}=${v}`).join("; ");
  const r = await fetch(new URL("/api/setups/set-wren-whip/attachments", app.baseURL), { method: "POST", body: form, headers: { cookie: cookieHeader, origin: app.baseURL } });
  console.log("upload", r.status, await r.text());
  // streamed 11 MB without content-length
  const t0 = Date.now();
  const result = await new Promise<string>((resolve) => {
    const boundary = "----x";
    const req = http.request(new URL("/api/setups/set-wren-whip/attachments", app.baseURL), { method: "POST", headers: { cookie: cookieHeader, origin: app.baseURL, "content-type": `multipart/form-data; boundary=${boundary}`, "transfer-encoding": "chunked" } });
    let sent = 0;
    let stop = false;
    req.on("response", (res) => {
      let body = "";
      res.on("data", (d) => (body += d));
      res.on("end", () => { stop = true; resolve(`status ${res.statusCode} after sending ${sent} bytes, ${Date.now() - t0} ms, headers ${JSON.stringify(res.headers)} body ${body}`); });
    });
    req.on("error", (e) => { stop = true; resolve(`error ${e.message} after ${sent}`); });
    req.write(`--${boundary}\r\ncontent-disposition: form-data; name="file"; filename="big.jpg"\r\ncontent-type: image/jpeg\r\n\r\n`);
    req.write(jpeg.subarray(0, 4200));
    const chunk = Buffer.alloc(64 * 1024, 7);
    const pump = () => {
      while (!stop && sent < 200 * 1024 * 1024) {
        sent += chunk.length;
        if (!req.write(chunk)) { req.once("drain", pump); return; }
      }
      if (!stop) { req.write(`\r\n--${boundary}--\r\n`); req.end(); }
    };
    pump();
  });
  console.log(result);
  const l = await c.get("/api/setups/set-wren-whip/attachments");
  console.log("list", l.status, await l.text());
} finally {
  await app.stop();
}
