import "server-only";

/** An absolute link into the app for e-mail, from the public URL it is served at. */
export function appUrl(pathname: string): string {
  const base = process.env.BETTER_AUTH_URL ?? `http://localhost:${process.env.PORT ?? "3000"}`;
  return new URL(pathname, base).toString();
}
