// Next calls register() once when a server process starts, in the Node.js runtime only (the edge
// runtime has no database or sockets). The server refuses to start on a database it cannot use,
// with one line saying why, rather than answering every request with a 500; then every request
// gets its client address resolved from its socket (the sign-in limit's key), and the mail
// outbox's delivery loop starts.
export async function register(): Promise<void> {
  if (process.env.NEXT_RUNTIME !== "nodejs" || process.env.NEXT_PHASE === "phase-production-build") return;
  const { checkDatabaseHealth } = await import("./db/health");
  const health = await checkDatabaseHealth();
  if (health.state !== "ready") {
    console.error(`[trimrail] not starting: ${health.message}`);
    process.exit(1);
  }
  const { startClientAddressHook } = await import("./lib/auth/client-address-hook");
  startClientAddressHook();
  const { startMailDelivery } = await import("./lib/mail/deliver");
  startMailDelivery();
}
