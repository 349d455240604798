// The landing page (pages/index.tsx) is served by the Pages Router, where Next refuses modules
// marked "server-only", so it cannot import the server core that reads a session. The proxy
// (proxy.ts) reads the viewer for it and hands on only whether there is one, in this request
// header; it always sets it, replacing any value the client sent under that name.
export const SIGNED_IN_HEADER = "x-trimrail-signed-in";
