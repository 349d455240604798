import "vitest";

declare module "vitest" {
  export interface ProvidedContext {
    baseURL: string;
    databaseUrl: string;
    mailDir: string;
    serverPid: number;
  }
}
