/**
 * One-off for data stored before photos became private (hardening #8): sets every stored photo
 * file's access to private at the upload service, so its old storage URL stops working; the app
 * serves photos through its own links either way. Safe to run again. Run with
 * `npm run photos:make-private` (DATABASE_URL and the UPLOADTHING_* variables of the deployment).
 */
import { asc, gt } from "drizzle-orm";
import { UTApi } from "uploadthing/server";
import { db, pool } from "@/db/client";
import { photos } from "@/db/schema";

const BATCH = 100;

const utapi = new UTApi();
let after = "";
let files = 0;
try {
  for (;;) {
    const rows = await db
      .select({ id: photos.id, fileKey: photos.fileKey, thumbKey: photos.thumbKey })
      .from(photos)
      .where(gt(photos.id, after))
      .orderBy(asc(photos.id))
      .limit(BATCH);
    if (rows.length === 0) break;
    const keys = rows.flatMap((r) => [r.fileKey, r.thumbKey]);
    const result = await utapi.updateACL(keys, "private");
    if (!result.success) throw new Error(`the upload service did not confirm the change for photos after ${after || "the start"}`);
    files += keys.length;
    after = rows.at(-1)!.id;
  }
  console.log(`${files} stored photo files are private.`);
} finally {
  await pool.end();
}
