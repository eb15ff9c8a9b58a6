import "server-only";
import { and, count, desc, eq, lt, or } from "drizzle-orm";
import { db } from "@/db/client";
import { components, inspectionAnswers, inspections, memberships, photos, presses, problemReports, serviceEntries, users } from "@/db/schema";
import { assertCan, canEditPhoto, ForbiddenError, NotFoundError } from "@/lib/auth/permissions";
import { photoFileUrl, type PhotoVariant } from "@/lib/photos/file-urls";
import type { PhotoKind } from "@/lib/photos/kinds";
import { ConflictError } from "@/lib/errors";
import { deleteStoredFiles, type StoredFile } from "@/lib/uploads/storage";
import type { PhotoPatch } from "@/lib/validation/photo";
import type { Actor } from "./actor";
import { assertNotRetired, pressAccess, type Executor } from "./press-access";
import { encodeTimeCursor, parseTimeCursor } from "./time-cursor";

/** What the gallery shows of a photo: no storage keys or storage URLs, the uploader by name. */
export type PhotoView = {
  id: string;
  pressId: string;
  componentId: string | null;
  componentLabel: string | null;
  kind: PhotoKind;
  caption: string | null;
  uploadedBy: string | null;
  uploaderName: string | null;
  url: string;
  width: number;
  height: number;
  thumbUrl: string;
  thumbWidth: number;
  thumbHeight: number;
  createdAt: Date;
};

/** The record a photo is attached to, after the server checked it. */
export type PhotoTarget = {
  pressId: string;
  componentId: string | null;
  serviceEntryId?: string | null;
  problemReportId?: string | null;
  inspectionItemId?: string | null;
};
export type StoredImage = StoredFile & { width: number; height: number; bytes: number };
export type NewPhoto = { id: string; kind: PhotoKind; caption: string | null; full: StoredImage; thumb: StoredImage };

const viewColumns = {
  id: photos.id,
  pressId: photos.pressId,
  componentId: photos.componentId,
  componentLabel: components.label,
  kind: photos.kind,
  caption: photos.caption,
  uploadedBy: photos.uploadedBy,
  uploaderName: users.displayName,
  width: photos.width,
  height: photos.height,
  thumbWidth: photos.thumbWidth,
  thumbHeight: photos.thumbHeight,
  createdAt: photos.createdAt,
};

function selectViews() {
  return db
    .select(viewColumns)
    .from(photos)
    .leftJoin(users, eq(users.id, photos.uploadedBy))
    .leftJoin(components, eq(components.id, photos.componentId))
    .$dynamic();
}

/**
 * Checks that the actor may attach photos to this press (and part) and returns the target.
 * Authorization: members of the press's shop with `attachPhoto` (another shop's press, or a part
 * of another press: NotFoundError). A retired press is a closed record and takes no new photos.
 */
export async function authorizePhotoTarget(
  actor: Actor,
  target: { pressId: string; componentId?: string | null; serviceEntryId?: string | null; problemReportId?: string | null; inspectionItemId?: string | null },
  executor: Executor = db,
): Promise<PhotoTarget> {
  const access = await pressAccess(executor, actor, target.pressId, "attachPhoto");
  assertNotRetired(access);
  const componentId = target.componentId ?? null;
  if (componentId) {
    const [part] = await executor
      .select({ id: components.id })
      .from(components)
      .where(and(eq(components.id, componentId), eq(components.pressId, target.pressId)))
      .limit(1);
    if (!part) throw new NotFoundError("Part not found on this press");
  }
  const serviceEntryId = target.serviceEntryId ?? null;
  if (serviceEntryId) {
    const [entry] = await executor
      .select({ id: serviceEntries.id })
      .from(serviceEntries)
      .where(and(eq(serviceEntries.id, serviceEntryId), eq(serviceEntries.pressId, target.pressId)))
      .limit(1);
    if (!entry) throw new NotFoundError("Service entry not found on this press");
  }
  const problemReportId = target.problemReportId ?? null;
  if (problemReportId) {
    const [report] = await executor
      .select({ id: problemReports.id })
      .from(problemReports)
      .where(and(eq(problemReports.id, problemReportId), eq(problemReports.pressId, target.pressId)))
      .limit(1);
    if (!report) throw new NotFoundError("Problem report not found on this press");
  }
  const inspectionItemId = target.inspectionItemId ?? null;
  if (inspectionItemId) {
    const [item] = await executor
      .select({ signedAt: inspections.signedAt })
      .from(inspectionAnswers)
      .innerJoin(inspections, eq(inspections.id, inspectionAnswers.inspectionId))
      .where(and(eq(inspectionAnswers.id, inspectionItemId), eq(inspections.pressId, target.pressId)))
      .limit(1);
    if (!item) throw new NotFoundError("Inspection item not found on this press");
    // A signed inspection is evidence as signed: no photos added afterwards.
    if (item.signedAt) throw new ConflictError("This inspection is signed: its record can no longer change.");
  }
  return { pressId: target.pressId, componentId, serviceEntryId, problemReportId, inspectionItemId };
}

/**
 * Records a processed photo whose files are already stored. Authorization: as
 * `authorizePhotoTarget`, checked again here because access may have changed since the upload began.
 */
export async function createPhotoRecord(actor: Actor, target: PhotoTarget, photo: NewPhoto): Promise<{ id: string }> {
  await db.transaction(async (tx) => {
    await authorizePhotoTarget(actor, target, tx);
    await tx.insert(photos).values({
      id: photo.id,
      pressId: target.pressId,
      componentId: target.componentId,
      serviceEntryId: target.serviceEntryId ?? null,
      problemReportId: target.problemReportId ?? null,
      inspectionItemId: target.inspectionItemId ?? null,
      kind: photo.kind,
      caption: photo.caption,
      uploadedBy: actor.userId,
      fileKey: photo.full.key,
      fileUrl: photo.full.url,
      width: photo.full.width,
      height: photo.full.height,
      bytes: photo.full.bytes,
      thumbKey: photo.thumb.key,
      thumbUrl: photo.thumb.url,
      thumbWidth: photo.thumb.width,
      thumbHeight: photo.thumb.height,
      thumbBytes: photo.thumb.bytes,
    });
  });
  return { id: photo.id };
}

/** Files are private at the storage service: a view carries short-lived app links (lib/photos/file-urls). */
function withFileUrls(row: Omit<PhotoView, "url" | "thumbUrl">, now = Date.now()): PhotoView {
  return { ...row, url: photoFileUrl(row.id, "full", now).url, thumbUrl: photoFileUrl(row.id, "thumb", now).url };
}

/** How many photos one page of a press's gallery carries by default, and at most. */
export const PHOTO_PAGE = 24;
export const PHOTO_PAGE_MAX = 100;

export type PhotoPage = { photos: PhotoView[]; nextCursor: string | null };

/**
 * A press's photos, newest first, optionally of one kind, a page at a time (keyset on the upload
 * time and id, so a page costs the same however many photos the press has). Authorization:
 * members of its shop.
 */
export async function listPressPhotos(actor: Actor, pressId: string, options: { kind?: PhotoKind; cursor?: string; limit?: number } = {}): Promise<PhotoPage> {
  await pressAccess(db, actor, pressId, "viewPress");
  const limit = Math.min(Math.max(1, options.limit ?? PHOTO_PAGE), PHOTO_PAGE_MAX);
  const after = parseTimeCursor(options.cursor);
  const rows = await selectViews()
    .where(
      and(
        eq(photos.pressId, pressId),
        options.kind ? eq(photos.kind, options.kind) : undefined,
        after ? or(lt(photos.createdAt, after.at), and(eq(photos.createdAt, after.at), lt(photos.id, after.id))) : undefined,
      ),
    )
    .orderBy(desc(photos.createdAt), desc(photos.id))
    .limit(limit + 1);
  const now = Date.now();
  const shown = rows.slice(0, limit);
  const last = shown.at(-1);
  return { photos: shown.map((row) => withFileUrls(row, now)), nextCursor: rows.length > limit && last ? encodeTimeCursor(last.createdAt, last.id) : null };
}

/** How many photos of each kind a press has (for the gallery's filter). Authorization: members of its shop. */
export async function countPressPhotos(actor: Actor, pressId: string): Promise<Partial<Record<PhotoKind, number>>> {
  await pressAccess(db, actor, pressId, "viewPress");
  const rows = await db.select({ kind: photos.kind, n: count() }).from(photos).where(eq(photos.pressId, pressId)).groupBy(photos.kind);
  return Object.fromEntries(rows.map((r) => [r.kind, r.n]));
}

/** Photos of one service entry, newest first (at most 50). Authorization: members of the press's shop. */
export async function listServiceEntryPhotos(actor: Actor, pressId: string, entryId: string): Promise<PhotoView[]> {
  await pressAccess(db, actor, pressId, "viewPress");
  const rows = await selectViews()
    .where(and(eq(photos.pressId, pressId), eq(photos.serviceEntryId, entryId)))
    .orderBy(desc(photos.createdAt), desc(photos.id))
    .limit(50);
  const now = Date.now();
  return rows.map((row) => withFileUrls(row, now));
}

/** One photo. Authorization: members of its press's shop; anyone else gets NotFoundError. */
export async function getPhoto(actor: Actor, photoId: string): Promise<PhotoView> {
  const [view] = await selectViews().where(eq(photos.id, photoId)).limit(1);
  if (!view) throw new NotFoundError("Photo not found");
  await pressAccess(db, actor, view.pressId, "viewPress");
  return withFileUrls(view);
}

/**
 * The storage key of one of a photo's files, for the route that streams it. Authorization:
 * members of its press's shop; another shop's photo (or an unknown id) is NotFoundError.
 */
export async function photoFileKey(actor: Actor, photoId: string, variant: PhotoVariant): Promise<string> {
  // One query per file served (a gallery asks for many): the photo, scoped to the actor's shops.
  const [row] = await db
    .select({ fileKey: photos.fileKey, thumbKey: photos.thumbKey, role: memberships.role })
    .from(photos)
    .innerJoin(presses, eq(presses.id, photos.pressId))
    .innerJoin(memberships, and(eq(memberships.shopId, presses.shopId), eq(memberships.userId, actor.userId)))
    .where(eq(photos.id, photoId))
    .limit(1);
  if (!row) throw new NotFoundError("Photo not found");
  assertCan(row.role, "viewPress");
  return variant === "thumb" ? row.thumbKey : row.fileKey;
}

/** The photo's press, storage keys and whether the actor may change it (uploader or manager). */
async function photoForChange(executor: Executor, actor: Actor, photoId: string) {
  const [row] = await executor
    .select({ pressId: photos.pressId, uploadedBy: photos.uploadedBy, fileKey: photos.fileKey, thumbKey: photos.thumbKey, signedAt: inspections.signedAt })
    .from(photos)
    .leftJoin(inspectionAnswers, eq(inspectionAnswers.id, photos.inspectionItemId))
    .leftJoin(inspections, eq(inspections.id, inspectionAnswers.inspectionId))
    .where(eq(photos.id, photoId))
    .limit(1);
  if (!row) throw new NotFoundError("Photo not found");
  // Another shop's photo reads as not-found, before any role question.
  const access = await pressAccess(executor, actor, row.pressId, "viewPress");
  const isUploader = row.uploadedBy === actor.userId;
  if (!canEditPhoto(access.role, isUploader)) throw new ForbiddenError(isUploader ? "attachPhoto" : "editAnyPhoto");
  // Evidence of a signed inspection stays as it was signed.
  if (row.signedAt) throw new ConflictError("This photo belongs to a signed inspection and can no longer change.");
  return { row, access };
}

/**
 * Changes a photo's caption or kind. Authorization: its uploader or a manager of its shop
 * (another shop: NotFoundError; other members: ForbiddenError); not on a retired press.
 */
export async function updatePhoto(actor: Actor, photoId: string, patch: PhotoPatch): Promise<PhotoView> {
  await db.transaction(async (tx) => {
    const { access } = await photoForChange(tx, actor, photoId);
    assertNotRetired(access);
    await tx.update(photos).set(patch).where(eq(photos.id, photoId));
  });
  return getPhoto(actor, photoId);
}

/**
 * Deletes a photo: its stored files through the upload service first, then the row, so a failed
 * storage call leaves the photo listed and the delete can be retried. Authorization: its uploader
 * or a manager of its shop (another shop: NotFoundError; other members: ForbiddenError). Allowed on
 * retired presses too: an uploader can always take back a picture they shared.
 */
export async function deletePhoto(actor: Actor, photoId: string): Promise<void> {
  const { row } = await photoForChange(db, actor, photoId);
  await deleteStoredFiles([row.fileKey, row.thumbKey]);
  await db.delete(photos).where(eq(photos.id, photoId));
}
