import { NextResponse, type NextRequest } from "next/server";
import { z } from "zod";
import { listComponents } from "@/lib/data/components";
import { getPress } from "@/lib/data/presses";
import { apiRoute, requireApiSession } from "@/lib/http";
import { componentsCsv, partsListCsv } from "@/lib/press/exports";

type Context = { params: Promise<{ pressId: string }> };

/** CSV download: `?what=components` (all, with history) or `?what=parts` (installed, costed, with totals). */
export const GET = apiRoute(async (req: NextRequest, { params }: Context) => {
  const current = await requireApiSession(req);
  const actor = { userId: current.user.id };
  const { pressId } = await params;
  const what = z.enum(["components", "parts"]).parse(req.nextUrl.searchParams.get("what") ?? "components");
  const press = await getPress(actor, pressId);
  const rows = await listComponents(actor, pressId, { includeRemoved: what === "components" });
  const csv = what === "components" ? componentsCsv(rows) : partsListCsv(rows, press.currency);
  const file = `${press.name.replace(/[^A-Za-z0-9-]+/g, "-").toLowerCase()}-${what}.csv`;
  return new NextResponse(csv, {
    headers: { "Content-Type": "text/csv; charset=utf-8", "Content-Disposition": `attachment; filename="${file}"` },
  });
});
