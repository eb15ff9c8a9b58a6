// Node has no XMLHttpRequest, which the browser client (uploadthing/client) uploads with. This is
// the smallest fetch-backed stand-in for what it uses: open, setRequestHeader, responseType "json",
// upload progress, load/error events, send(FormData) and abort. `window` stays undefined, so the
// SDK keeps its server-side code paths (spec §6).

class UploadProgressEvent extends Event {
  constructor(
    readonly loaded: number,
    readonly total: number,
  ) {
    super("progress");
  }
}

function bodySize(body: BodyInit | null): number {
  if (!(body instanceof FormData)) return 0;
  let size = 0;
  for (const [, value] of body.entries()) size += typeof value === "string" ? value.length : value.size;
  return size;
}

export class FetchXhr {
  status = 0;
  statusText = "";
  response: unknown = null;
  responseType: XMLHttpRequestResponseType = "";
  readonly upload = new EventTarget();
  private readonly events = new EventTarget();
  private readonly headers = new Headers();
  private readonly controller = new AbortController();
  private method = "GET";
  private url = "";

  open(method: string, url: string | URL): void {
    this.method = method;
    this.url = String(url);
  }

  setRequestHeader(name: string, value: string): void {
    this.headers.set(name, value);
  }

  addEventListener(type: string, listener: (event: Event) => void): void {
    this.events.addEventListener(type, listener);
  }

  send(body: BodyInit | null = null): void {
    void this.run(body);
  }

  abort(): void {
    this.controller.abort();
  }

  private async run(body: BodyInit | null): Promise<void> {
    try {
      const res = await fetch(this.url, { method: this.method, headers: this.headers, body, signal: this.controller.signal });
      const total = bodySize(body);
      this.upload.dispatchEvent(new UploadProgressEvent(total, total));
      const text = await res.text();
      this.status = res.status;
      this.statusText = res.statusText;
      this.response = this.responseType === "json" ? parseJsonOrNull(text) : text;
      this.events.dispatchEvent(new Event("load"));
    } catch {
      this.events.dispatchEvent(new Event(this.controller.signal.aborted ? "abort" : "error"));
    }
  }
}

/** An XHR with responseType "json" yields null for a body that is not JSON. */
function parseJsonOrNull(text: string): unknown {
  try {
    return JSON.parse(text);
  } catch {
    return null;
  }
}

export function installFetchXhr(): void {
  Object.assign(globalThis, { XMLHttpRequest: FetchXhr });
}
