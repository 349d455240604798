import "vitest";

declare module "vitest" {
  export interface ProvidedContext {
    baseURL: string;
    databaseUrl: string;
    mailDir: string;
    s3Env: Record<string, string>;
    serverPid: number;
  }
}
