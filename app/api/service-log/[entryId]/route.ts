import { NextResponse, type NextRequest } from "next/server";
import { getServiceEntry, listServiceRevisions, updateServiceEntry } from "@/lib/data/service-log";
import { apiRoute, requireApiSession, readJsonBody } from "@/lib/http";
import { serviceEntryPatchSchema } from "@/lib/validation/service";

type Context = { params: Promise<{ entryId: string }> };

/** One entry with its corrections. Members of the shop. */
export const GET = apiRoute(async (req: NextRequest, { params }: Context) => {
  const current = await requireApiSession(req);
  const actor = { userId: current.user.id };
  const { entryId } = await params;
  const [entry, revisions] = await Promise.all([getServiceEntry(actor, entryId), listServiceRevisions(actor, entryId)]);
  return NextResponse.json({ entry, revisions });
});

/** Corrects an entry; the change is kept as a revision. Managers and inspectors. */
export const PATCH = apiRoute(async (req: NextRequest, { params }: Context) => {
  const current = await requireApiSession(req);
  const { entryId } = await params;
  const patch = serviceEntryPatchSchema.parse(await readJsonBody(req));
  await updateServiceEntry({ userId: current.user.id }, entryId, patch);
  return NextResponse.json({ ok: true });
});
