// The fake's mailbox: one JSON file per message, named so that names sort by arrival.
import { randomBytes } from "node:crypto";
import { mkdir, readdir, readFile, rm, writeFile } from "node:fs/promises";
import path from "node:path";

const NAME = /^\d{13}-[0-9a-f]{12}\.json$/;

export class MailStore {
  constructor(dir) {
    this.dir = dir;
  }

  async init() {
    await mkdir(this.dir, { recursive: true });
  }

  async save(message) {
    const id = `${Date.now()}-${randomBytes(6).toString("hex")}`;
    await writeFile(path.join(this.dir, `${id}.json`), JSON.stringify({ id, ...message }));
    return id;
  }

  async names() {
    return (await readdir(this.dir)).filter((n) => NAME.test(n)).sort().reverse();
  }

  async get(id) {
    if (!NAME.test(`${id}.json`)) return null;
    try {
      return JSON.parse(await readFile(path.join(this.dir, `${id}.json`), "utf8"));
    } catch {
      return null;
    }
  }

  /** Newest first; `to` keeps messages whose envelope recipients include that address. */
  async list({ to, limit }) {
    const out = [];
    const wanted = to ? to.toLowerCase() : null;
    for (const name of await this.names()) {
      const message = await this.get(name.slice(0, -5));
      if (!message) continue;
      if (wanted && !message.envelope.to.some((a) => a.toLowerCase() === wanted)) continue;
      out.push(message);
      if (out.length >= limit) break;
    }
    return out;
  }

  async clear() {
    for (const name of await this.names()) await rm(path.join(this.dir, name), { force: true });
  }
}
