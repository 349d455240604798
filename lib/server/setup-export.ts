import "server-only";
import Papa from "papaparse";
import { pageOfSetupsForExport } from "@/db/queries/insight";
import { ok, type Result } from "@/lib/errors";
import type { FileBody } from "./route";

// Every setup as one CSV row, for the maker's own analysis. Header names carry their SI units.
const COLUMNS = [
  ["id", "id"],
  ["name", "name"],
  ["status", "status"],
  ["owner_id", "ownerId"],
  ["model_id", "modelId"],
  ["unit_id", "unitId"],
  ["mount_id", "mountId"],
  ["mount_position_x_m", "mountPositionXM"],
  ["payload_mass_kg", "payloadMassKg"],
  ["free_lift_ratio", "freeLiftRatio"],
  ["worst_flag", "worstFlag"],
  ["altitude_m", "altitudeM"],
  ["temperature_c", "temperatureC"],
  ["wind_m_s", "windMS"],
  ["gust_m_s", "gustMS"],
  ["purity_fraction", "purity"],
  ["fill_fraction", "fillFraction"],
  ["tether_length_out_m", "tetherLengthOutM"],
  ["created_at_utc", "createdAt"],
  ["updated_at_utc", "updatedAt"],
  ["submitted_at_utc", "submittedAt"],
] as const;

const PAGE = 2000;
const cell = (value: unknown) => (value instanceof Date ? value.toISOString() : (value ?? ""));

/** The export as a stream: pages of rows are read as the download proceeds, never all at once. */
export async function exportSetupsCsv(): Promise<Result<FileBody>> {
  const encoder = new TextEncoder();
  let afterId = "";
  let headerSent = false;
  const stream = new ReadableStream<Uint8Array>({
    async pull(controller) {
      const rows = await pageOfSetupsForExport({ afterId, limit: PAGE });
      const data = rows.map((r) => COLUMNS.map(([, key]) => cell(r[key])));
      const text = Papa.unparse({ fields: COLUMNS.map(([h]) => h), data }, { header: !headerSent, newline: "\r\n" });
      if (text) controller.enqueue(encoder.encode(`${text}\r\n`));
      headerSent = true;
      if (rows.length < PAGE) controller.close();
      else afterId = rows[rows.length - 1].id;
    },
  });
  return ok({
    bytes: stream,
    contentType: "text/csv; charset=utf-8",
    fileName: `trimrail-setups-${new Date().toISOString().slice(0, 10)}.csv`,
    disposition: "attachment",
  });
}
