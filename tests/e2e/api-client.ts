/** Plain HTTP calls to a running server, as a same-origin browser would send them (for the fault and instance tests). */
import { DEMO_PASSWORD } from "@/db/demo-data";

export type Answer = { status: number; body: string; headers: Headers };

export async function call(baseUrl: string, path: string, options: { method?: string; body?: unknown; cookie?: string } = {}): Promise<Answer> {
  const res = await fetch(`${baseUrl}${path}`, {
    method: options.method ?? (options.body === undefined ? "GET" : "POST"),
    headers: {
      origin: baseUrl,
      "sec-fetch-site": "same-origin",
      ...(options.body === undefined ? {} : { "content-type": "application/json" }),
      ...(options.cookie ? { cookie: options.cookie } : {}),
    },
    body: options.body === undefined ? undefined : JSON.stringify(options.body),
    redirect: "manual",
  });
  return { status: res.status, body: await res.text(), headers: res.headers };
}

/** Signs in through POST /api/auth/sign-in; the session cookie as a Cookie header value. */
export async function signInApi(baseUrl: string, email: string, password = DEMO_PASSWORD): Promise<string> {
  const answer = await call(baseUrl, "/api/auth/sign-in", { body: { email, password } });
  const cookie = answer.headers.getSetCookie().map((c) => c.split(";")[0]).find((c) => c?.includes("session="));
  if (answer.status !== 200 || !cookie) throw new Error(`sign-in as ${email} failed: ${answer.status} ${answer.body}`);
  return cookie;
}

/** A press of the signed-in user's current shop that may be used and booked. */
export async function usablePressId(baseUrl: string, cookie: string): Promise<string> {
  const answer = await call(baseUrl, "/api/presses", { cookie });
  const { presses } = JSON.parse(answer.body) as { presses: { id: string; status: { usable: boolean } }[] };
  const press = presses.find((p) => p.status.usable);
  if (!press) throw new Error(`no usable press: ${answer.body}`);
  return press.id;
}
