import { NextResponse, type NextRequest } from "next/server";
import { getPress } from "@/lib/data/presses";
import { createServiceEntry, listServiceEntries } from "@/lib/data/service-log";
import { apiRoute, requireApiSession, readJsonBody } from "@/lib/http";
import { serviceLogCsv } from "@/lib/service/exports";
import { serviceEntryInputSchema, serviceLogQuerySchema } from "@/lib/validation/service";

type Context = { params: Promise<{ pressId: string }> };

/** Most rows one CSV download carries; the log of a shop press stays far below this. */
const CSV_MAX_ROWS = 5_000;

/**
 * A page of the log (`?limit=&cursor=&kind=`, newest first, `nextCursor` for the next page), or
 * with `?format=csv` the whole log (up to 5,000 rows) as a download. Members of the shop.
 */
export const GET = apiRoute(async (req: NextRequest, { params }: Context) => {
  const current = await requireApiSession(req);
  const actor = { userId: current.user.id };
  const { pressId } = await params;
  const { format, ...query } = Object.fromEntries(req.nextUrl.searchParams);
  if (format === "csv") {
    const press = await getPress(actor, pressId);
    const { entries } = await listServiceEntries(actor, pressId, { limit: CSV_MAX_ROWS });
    const file = `${press.name.replace(/[^A-Za-z0-9-]+/g, "-").toLowerCase()}-service-log.csv`;
    return new NextResponse(serviceLogCsv(entries, press.currency), {
      headers: { "Content-Type": "text/csv; charset=utf-8", "Content-Disposition": `attachment; filename="${file}"` },
    });
  }
  return NextResponse.json(await listServiceEntries(actor, pressId, serviceLogQuerySchema.parse(query)));
});

/** Logs service. Managers and inspectors; 400 names the field, 409 for an hour meter below the last reading. */
export const POST = apiRoute(async (req: NextRequest, { params }: Context) => {
  const current = await requireApiSession(req);
  const { pressId } = await params;
  const input = serviceEntryInputSchema.parse(await readJsonBody(req));
  return NextResponse.json(await createServiceEntry({ userId: current.user.id }, pressId, input), { status: 201 });
});
