// Streams one uploaded file to a temp path, counting bytes against the signed size and hashing
// them (MD5, which the SDK reports as fileHash). Multipart (field "file", as the SDK sends) or raw.
import { createHash } from "node:crypto";
import { createWriteStream, rmSync } from "node:fs";
import busboy from "busboy";
import { HttpError } from "./http-util.mjs";

/** Resolves { bytes, fileHash, partType } once the whole body is on disk; rejects with HttpError. */
export function receiveUpload(req, tmpPath, declaredSize) {
  return new Promise((resolve, reject) => {
    const out = createWriteStream(tmpPath, { flags: "wx" });
    const hash = createHash("md5");
    let bytes = 0;
    let failed = false;
    let fileSeen = false;
    let bodyDone = false;
    let partType = null;
    let active = null;

    const fail = (status, message) => {
      if (failed) return;
      failed = true;
      out.destroy();
      rmSync(tmpPath, { force: true });
      // Keep reading (and discarding) the rest so the client gets our answer, not a reset.
      active?.resume();
      reject(new HttpError(status, message));
    };
    const maybeDone = () => {
      if (failed || !bodyDone || !out.writableFinished) return;
      if (bytes < declaredSize) fail(400, `Incomplete upload: ${bytes} of ${declaredSize} bytes received`);
      else resolve({ bytes, fileHash: hash.digest("hex"), partType });
    };
    const take = (stream) => {
      fileSeen = true;
      active = stream;
      stream.on("data", (chunk) => {
        if (failed) return;
        bytes += chunk.length;
        if (bytes > declaredSize) return fail(413, `Upload is larger than the signed size of ${declaredSize} bytes`);
        hash.update(chunk);
        if (!out.write(chunk)) {
          stream.pause();
          out.once("drain", () => stream.resume());
        }
      });
      stream.on("end", () => {
        if (!failed) out.end();
      });
    };

    out.on("finish", maybeDone);
    out.on("error", (error) => fail(500, `Could not store the upload: ${error.message}`));
    req.on("close", () => {
      if (!req.complete) fail(400, "Upload interrupted");
    });

    if (!/^multipart\/form-data/i.test(req.headers["content-type"] ?? "")) {
      take(req);
      req.on("end", () => {
        bodyDone = true;
        maybeDone();
      });
      return;
    }
    let parser;
    try {
      parser = busboy({ headers: req.headers, limits: { files: 1, fields: 16, fieldSize: 64 * 1024 } });
    } catch {
      fail(400, "Malformed multipart body");
      req.resume();
      return;
    }
    parser.on("file", (name, stream, info) => {
      if (name !== "file" || fileSeen) {
        stream.resume();
        return;
      }
      partType = info.mimeType || null;
      take(stream);
    });
    parser.on("filesLimit", () => fail(400, "Only one file per upload"));
    parser.on("error", () => {
      fail(400, "Malformed multipart body");
      req.unpipe(parser);
      req.resume();
    });
    parser.on("close", () => {
      bodyDone = true;
      if (!fileSeen) {
        out.end();
        fail(400, 'Multipart body has no "file" part');
      } else maybeDone();
    });
    req.pipe(parser);
  });
}
