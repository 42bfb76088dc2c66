// GET /api/orgs/[orgSlug]/price-books/[priceBookId]/csv — the items as a CSV download; POST { csv, mode, apply } — preview an import, or apply it all or nothing
import { NextResponse, type NextRequest } from "next/server";
import { getPriceBook } from "@/lib/server/price-books/books";
import { applyPriceBookImport, previewPriceBookImport } from "@/lib/server/price-books/import";
import { withOrg } from "@/lib/api/with-org";
import { parseId } from "@/lib/api/read-input";
import { AppError, fieldErrors, invalid } from "@/lib/errors";
import { csvFileName, itemsToCsv } from "@/lib/price-books/csv";
import { csvImportSchema } from "@/lib/validators/price-books";

type Params = { orgSlug: string; priceBookId: string };

// A book of a couple of thousand items is well under this; the shared JSON reader stops at 64 KB.
const MAX_IMPORT_BYTES = 2 * 1024 * 1024;

async function readImport(req: NextRequest) {
  if (!(req.headers.get("content-type") ?? "").includes("application/json")) {
    throw new AppError(400, "Send the request body as JSON (Content-Type: application/json).");
  }
  const raw = await req.text();
  if (new TextEncoder().encode(raw).length > MAX_IMPORT_BYTES) throw new AppError(413, "The CSV is too large: import at most 2 MB at once.");
  let body: unknown;
  try {
    body = JSON.parse(raw);
  } catch {
    throw new AppError(400, "The request body is not valid JSON.");
  }
  const parsed = csvImportSchema.safeParse(body);
  if (!parsed.success) throw invalid(fieldErrors(parsed.error));
  return parsed.data;
}

export const GET = withOrg<Params>(
  async ({ params, org }) => {
    const book = await getPriceBook({ orgId: org.orgId, priceBookId: parseId(params.priceBookId, "price book") });
    return new NextResponse(itemsToCsv(book.items), {
      headers: {
        "content-type": "text/csv; charset=utf-8",
        "content-disposition": `attachment; filename="${csvFileName(book.name, new Date())}"`,
        "cache-control": "no-store",
      },
    });
  },
  { permission: "priceBook.read" },
);

// Previewing writes nothing, but it is the first step of an import, which only admins make.
export const POST = withOrg<Params>(
  async ({ req, params, org }) => {
    const scope = { orgId: org.orgId, userId: org.userId, priceBookId: parseId(params.priceBookId, "price book") };
    const input = await readImport(req);
    const preview = input.apply ? await applyPriceBookImport(scope, input) : await previewPriceBookImport(scope, input);
    return NextResponse.json({ applied: input.apply, preview });
  },
  { permission: "priceBook.write" },
);
