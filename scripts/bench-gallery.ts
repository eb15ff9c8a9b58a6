/**
 * Benchmark: what the press gallery costs a signed-in member — list a press's photos through the
 * data layer (as the page and GET /api/presses/{id}/photos do), then fetch every thumbnail the way
 * a browser would (6 at a time): a relative link goes through the app's photo-file route (session,
 * membership, private storage), an absolute one straight to the upload service. Prints the median and p90 over
 * several rounds; asserts nothing. Run with `npm run bench:gallery` against a test database
 * (DATABASE_URL → presswright_test, migrated); it starts its own upload fake on a free port.
 */
import { mkdtemp, rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { performance } from "node:perf_hooks";
import sharp from "sharp";
import { startFake } from "../tests/integration/fake-uploadthing/harness";
import { localUploadthingEnv } from "@/lib/uploads/env";

const PHOTOS = Number(process.env.BENCH_PHOTOS ?? 24);
const ROUNDS = Number(process.env.BENCH_ROUNDS ?? 15);
const BROWSER_CONNECTIONS = 6;

if (!/\/presswright_test(\?|$)/.test(process.env.DATABASE_URL ?? "")) {
  console.error("Set DATABASE_URL to the presswright_test database (it gets a throw-away user, shop and press).");
  process.exit(1);
}

const dir = await mkdtemp(path.join(tmpdir(), "presswright-bench-gallery-"));
const fake = await startFake({ dir, callbackTimeoutMs: 10_000 });
Object.assign(process.env, localUploadthingEnv(fake.port), { UPLOADTHING_LOG_LEVEL: "None" });

// Loaded after the environment is set: the SDK and the database client read it on first use.
const { createUserWithPersonalShop } = await import("@/lib/data/users");
const { createPress } = await import("@/lib/data/press-edits");
const { createPhotoRecord, listPressPhotos } = await import("@/lib/data/photos");
const { processPhoto } = await import("@/lib/photos/pipeline");
const { storeJpegs } = await import("@/lib/uploads/storage");
const { newId } = await import("@/lib/ids");
const { db, pool } = await import("@/db/client");
const { photos } = await import("@/db/schema");
const { eq } = await import("drizzle-orm");
const { createSession } = await import("@/lib/auth/session");
const { NextRequest } = await import("next/server");
// The route exists once photos are private; before that every thumbnail URL is absolute.
const photoFileRoute = await import("@/app/photo-files/[photoId]/[variant]/route").catch(() => null);

function quantile(values: number[], q: number): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))]!;
}

async function get(url: string, cookie: string): Promise<Response> {
  if (!url.startsWith("/")) return fetch(url);
  const [, photoId, variant] = /^\/photo-files\/([^/]+)\/([^?]+)/.exec(url) ?? [];
  if (!photoFileRoute || !photoId || !variant) throw new Error(`no route for ${url}`);
  return photoFileRoute.GET(new NextRequest(`http://127.0.0.1:3000${url}`, { headers: { cookie } }), { params: Promise.resolve({ photoId, variant }) });
}

async function fetchAll(urls: string[], cookie: string): Promise<number> {
  let bytes = 0;
  let next = 0;
  const worker = async (): Promise<void> => {
    while (next < urls.length) {
      const res = await get(urls[next++]!, cookie);
      if (!res.ok) throw new Error(`thumbnail answered ${res.status}`);
      bytes += (await res.arrayBuffer()).byteLength;
    }
  };
  await Promise.all(Array.from({ length: BROWSER_CONNECTIONS }, worker));
  return bytes;
}

try {
  const email = `bench-gallery-${Date.now().toString(36)}@test.example`;
  const { userId, shopId } = await createUserWithPersonalShop({ email, displayName: "Gallery bench", password: "bench gallery password" });
  const actor = { userId };
  const { id: pressId } = await createPress(actor, shopId, { name: "Gallery bench press", frameType: "h-frame", lifecycle: "in-service" });
  const source = await sharp({ create: { width: 1600, height: 1200, channels: 3, background: { r: 90, g: 110, b: 130 } } }).jpeg().toBuffer();
  const processed = await processPhoto(new Uint8Array(source));
  for (let i = 0; i < PHOTOS; i++) {
    const id = newId();
    const [full, thumb] = await storeJpegs(
      [
        { name: `${id}.jpg`, data: processed.full.data },
        { name: `${id}-thumb.jpg`, data: processed.thumb.data },
      ],
      () => undefined,
    );
    const image = (file: { key: string; url: string }, e: { width: number; height: number; bytes: number }) => ({ ...file, width: e.width, height: e.height, bytes: e.bytes });
    await createPhotoRecord(actor, { pressId, componentId: null }, { id, kind: "other", caption: null, full: image(full!, processed.full), thumb: image(thumb!, processed.thumb) });
  }

  const cookie = `session=${(await createSession(userId)).token}`;
  // Reference under the same load: the same thumbnails fetched straight from storage, as browsers
  // did while photos were public (here through storage URLs signed in advance, outside the timing).
  const { UTApi } = await import("uploadthing/server");
  const utapi = new UTApi();
  const keys = await db.select({ key: photos.thumbKey }).from(photos).where(eq(photos.pressId, pressId));
  const direct = await Promise.all(keys.map(async ({ key }) => (await utapi.generateSignedURL(key, { expiresIn: 3600 })).ufsUrl));

  const listMs: number[] = [];
  const totalMs: number[] = [];
  const directMs: number[] = [];
  let bytes = 0;
  // Interleaved rounds, so drift in machine load affects both measurements alike.
  for (let round = 0; round < ROUNDS + 2; round++) {
    const start = performance.now();
    const { photos: views } = await listPressPhotos(actor, pressId);
    const listed = performance.now();
    bytes = await fetchAll(
      views.map((v) => v.thumbUrl),
      cookie,
    );
    const done = performance.now();
    await fetchAll(direct, cookie);
    const directDone = performance.now();
    if (round >= 2) {
      listMs.push(listed - start);
      totalMs.push(done - start);
      directMs.push(directDone - done);
    }
  }
  const line = (label: string, ms: number[]) => console.log(`  ${label.padEnd(44)} median ${quantile(ms, 0.5).toFixed(1)} ms, p90 ${quantile(ms, 0.9).toFixed(1)} ms`);
  console.log(`gallery of ${PHOTOS} photos, ${ROUNDS} rounds (after 2 warm-up), thumbnails ${Math.round(bytes / 1024)} kB in all`);
  line("list photos", listMs);
  line("list + fetch thumbnails (as the page does)", totalMs);
  line("thumbnails straight from storage (reference)", directMs);
} finally {
  await pool.end();
  await fake.stop();
  await rm(dir, { recursive: true, force: true });
}
