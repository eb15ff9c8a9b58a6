import { NextResponse, type NextRequest } from "next/server";
import { signInspection } from "@/lib/data/inspection-sign";
import { apiRoute, parseJsonText, readBodyText, requireApiSession } from "@/lib/http";
import { signInspectionSchema } from "@/lib/validation/inspection";

type Context = { params: Promise<{ inspectionId: string }> };

/**
 * Signs the inspection as the session's user. 403 for a role the checklist does not allow, 409
 * when already signed or not complete, 401 `{ reauthenticate: true }` when the sign-in is too old.
 */
export const POST = apiRoute(async (req: NextRequest, { params }: Context) => {
  const current = await requireApiSession(req);
  const { inspectionId } = await params;
  // An empty body is allowed (nothing to send); anything else must be the (empty) JSON object.
  const text = await readBodyText(req);
  signInspectionSchema.parse(text ? parseJsonText(text) : {});
  const outcome = await signInspection({ userId: current.user.id, signedInAt: current.session.createdAt }, inspectionId);
  return NextResponse.json(outcome);
});
