import "server-only";
import { randomUUID } from "node:crypto";
import type { AppError } from "@/lib/errors";

/** Logs an unexpected failure under a fresh request id and returns the error a person may see. */
export function internalError(error: unknown, where: string): AppError {
  const requestId = randomUUID().slice(0, 8);
  console.error(`[trimrail] request ${requestId} (${where}) failed:`, error);
  return {
    code: "internal",
    message: `Something went wrong on our side. Quote request ${requestId} if you report it.`,
    requestId,
  };
}
