// Guards the production server (scripts/server.mjs) applies before Next.js sees a request.
//
// A path with a malformed percent-escape (/api/presses/%ff) cannot name anything; Next.js answers
// it with a bare 500 from its router, so it is answered 400 here, the one place every path passes.
//
// The overall cap on request bodies: a declared
// Content-Length over the cap is answered 413 before a byte is read; a chunked body is counted as
// Node's HTTP parser hands it over (IncomingMessage#push) and cut off as soon as it passes the cap,
// so no route — however it reads its body — can be made to buffer more than the cap.

function refuseTooLarge(req, res) {
  if (!res.headersSent) {
    res.writeHead(413, { "content-type": "application/json", connection: "close" });
    res.end(JSON.stringify({ error: "Request body too large." }));
  }
  // Stop reading: whatever else the client sends goes with the connection. The socket is half-
  // closed first and destroyed a moment later, so a client still writing can read the 413 (an
  // unread body is never buffered: the paused request lets TCP flow control stop the sender).
  const close = () => {
    req.socket.end();
    setTimeout(() => req.destroy(), 1000).unref();
  };
  if (res.writableFinished) close();
  else res.on("finish", close);
}

/** Returns false when the request was refused (413 already sent); otherwise watches its body. */
export function capRequestBody(req, res, maxBytes) {
  const declared = req.headers["content-length"];
  if (declared !== undefined && !(/^\d+$/.test(declared) && Number(declared) <= maxBytes)) {
    refuseTooLarge(req, res);
    return false;
  }
  let received = 0;
  let cut = false;
  const push = req.push;
  req.push = function (chunk, encoding) {
    // Once cut off, nothing more reaches the reader — not even the end of the body, so a truncated
    // body is never taken for a complete one; `false` makes Node stop reading the socket.
    if (cut) return false;
    if (chunk !== null && chunk !== undefined) {
      received += chunk.length;
      if (received > maxBytes) {
        cut = true;
        refuseTooLarge(req, res);
        return false;
      }
    }
    return push.call(this, chunk, encoding);
  };
  return true;
}

/** Answers 400 and returns false when the path holds a malformed percent-escape. */
export function refuseMalformedPath(req, res) {
  const path = (req.url ?? "/").split("?", 1)[0];
  try {
    decodeURIComponent(path);
    return true;
  } catch {
    res.writeHead(400, { "content-type": "application/json" });
    res.end(JSON.stringify({ error: "The address contains a malformed percent-escape." }));
    return false;
  }
}
