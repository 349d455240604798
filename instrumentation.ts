// Next calls register() once when a server process starts. The mail outbox's delivery loop runs
// there, in the Node.js runtime only: the edge runtime has no sockets for SMTP nor the database.
export async function register(): Promise<void> {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  const { startMailDelivery } = await import("./lib/mail/deliver");
  startMailDelivery();
}
