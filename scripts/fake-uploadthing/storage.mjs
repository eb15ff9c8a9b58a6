// Files on disk: FAKE_UT_DIR/{key} holds the bytes, {key}.json the metadata (spec §4).
// Every write goes to a temp file first and is renamed into place, so a crash never leaves a
// half-written file behind a valid name.
import { randomUUID } from "node:crypto";
import { mkdirSync, rmSync } from "node:fs";
import { readdir, readFile, rename, rm, writeFile } from "node:fs/promises";
import path from "node:path";

export class Storage {
  constructor(dir) {
    this.dir = dir;
    this.tmpDir = path.join(dir, ".tmp");
    // Leftovers of uploads cut off by a crash or kill; nothing refers to them.
    rmSync(this.tmpDir, { recursive: true, force: true });
    mkdirSync(this.tmpDir, { recursive: true });
  }

  /** Callers validate keys against KEY_PATTERN first, so a key can never leave the folder. */
  bytesPath(key) {
    return path.join(this.dir, key);
  }

  metaPath(key) {
    return path.join(this.dir, `${key}.json`);
  }

  newTempPath() {
    return path.join(this.tmpDir, `${randomUUID()}.part`);
  }

  async discard(tmpPath) {
    await rm(tmpPath, { force: true });
  }

  /** Moves received bytes into place, then writes the metadata that makes the file visible. */
  async commit(tmpPath, meta) {
    await rename(tmpPath, this.bytesPath(meta.key));
    await this.writeMeta(meta);
  }

  async writeMeta(meta) {
    const tmp = this.newTempPath();
    await writeFile(tmp, JSON.stringify(meta, null, 2));
    await rename(tmp, this.metaPath(meta.key));
  }

  async get(key) {
    try {
      return JSON.parse(await readFile(this.metaPath(key), "utf8"));
    } catch (error) {
      if (error.code === "ENOENT") return null;
      throw error;
    }
  }

  /** All stored files, oldest first. */
  async list() {
    const names = (await readdir(this.dir)).filter((name) => name.endsWith(".json"));
    const metas = await Promise.all(names.map((name) => this.get(name.slice(0, -".json".length))));
    return metas.filter(Boolean).sort((a, b) => a.uploadedAt - b.uploadedAt || a.key.localeCompare(b.key));
  }

  async findByCustomId(customId) {
    return (await this.list()).find((meta) => meta.customId === customId) ?? null;
  }

  /** Resolves a {fileKey} or {customId} reference to stored metadata, or null. */
  async resolve(ref) {
    if (typeof ref.fileKey === "string") return this.get(ref.fileKey);
    if (typeof ref.customId === "string") return this.findByCustomId(ref.customId);
    return null;
  }

  /** Metadata first: once it is gone the file is no longer served, even if unlinking bytes fails. */
  async remove(key) {
    const existed = (await this.get(key)) !== null;
    await rm(this.metaPath(key), { force: true });
    await rm(this.bytesPath(key), { force: true });
    return existed;
  }
}
