import { MAKER_ONLY } from "@/lib/domain";
import { importTemplatesCsv } from "@/lib/server/catalogue";
import { route } from "@/lib/server/route";
import { templatesImportBodySchema } from "../../schema";

/** POST /api/catalogue/templates/import { csv } — all rows or none; a bad row is a 422 naming its row, column and problem. */
export const POST = route({ roles: MAKER_ONLY, body: templatesImportBodySchema }, ({ viewer, body }) =>
  importTemplatesCsv({ viewer, csv: body.csv }),
);
