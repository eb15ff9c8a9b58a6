import { describe, expect, it } from "vitest";
import { z } from "zod";
import { ForbiddenError, NotFoundError } from "@/lib/auth/permissions";
import { isDatabaseUnavailable } from "@/lib/errors";
import { errorResponse, JSON_DEPTH_LIMIT, MalformedBodyError, parseJsonText } from "@/lib/http";

describe("API error answers", () => {
  it("maps the data layer's errors to 404, 403, 400 and 503 without leaking details", async () => {
    expect(errorResponse(new NotFoundError("Press not found")).status).toBe(404);
    expect(errorResponse(new ForbiddenError("editPress")).status).toBe(403);

    const zod = z.strictObject({ a: z.number() }).safeParse({ a: "x" });
    const bad = errorResponse(zod.error);
    expect(bad.status).toBe(400);
    expect(await bad.json()).toMatchObject({ fieldErrors: { a: [expect.any(String)] } });

    const down = errorResponse(Object.assign(new Error("connect ECONNREFUSED 127.0.0.1:3407"), { code: "ECONNREFUSED" }));
    expect(down.status).toBe(503);
    expect(down.headers.get("retry-after")).toBe("5");
    const body = JSON.stringify(await down.json());
    expect(body).not.toContain("3407");
    expect(body).not.toContain("ECONNREFUSED");
  });

  it("answers 503 for a connection the server closed, also inside a query error's cause", () => {
    const closed = Object.assign(new Error("Can't add new command when connection is in closed state"), { fatal: true });
    const killed = Object.assign(new Error("Connection was killed"), { code: "ER_CONNECTION_KILLED", errno: 1927 });
    const wrapped = new Error("Failed query: insert into `problems` …", { cause: killed });
    for (const error of [closed, killed, wrapped]) expect(errorResponse(error).status).toBe(503);
    // A statement the server refused on a live connection is a bug, not an outage.
    expect(isDatabaseUnavailable(Object.assign(new Error("Duplicate entry"), { code: "ER_DUP_ENTRY", fatal: false }))).toBe(false);
  });

  it("answers anything unexpected with a bare 500", async () => {
    const original = console.error;
    console.error = () => {};
    try {
      const res = errorResponse(new Error("SELECT * FROM users WHERE secret"));
      expect(res.status).toBe(500);
      expect(JSON.stringify(await res.json())).not.toMatch(/SELECT|secret|at /);
    } finally {
      console.error = original;
    }
  });

  it("answers a value MariaDB refuses (too long, out of range, a failed CHECK) 400 without the SQL", async () => {
    const original = console.warn;
    console.warn = () => {};
    try {
      for (const errno of [1406, 1264, 4025]) {
        const driver = Object.assign(new Error("Data too long for column 'name' at row 1"), { errno });
        const res = errorResponse(Object.assign(new Error("Failed query: insert into `presses` …"), { cause: driver }));
        expect(res.status).toBe(400);
        expect(JSON.stringify(await res.json())).not.toMatch(/insert|column/);
      }
    } finally {
      console.warn = original;
    }
  });
});

describe("JSON body text", () => {
  it("parses objects nested up to the limit, with brackets inside strings not counted", () => {
    const deep = `${"[".repeat(JSON_DEPTH_LIMIT)}"[[[[{{{{"${"]".repeat(JSON_DEPTH_LIMIT)}`;
    expect(() => parseJsonText(deep)).not.toThrow();
    expect(parseJsonText(String.raw`{"a":"\\\"[","b":["\ud83d\ude00"]}`)).toEqual({ a: '\\"[', b: ["\u{1F600}"] });
  });

  it("refuses deeper nesting, lone surrogates in keys or values, and text that is not JSON", async () => {
    const cases = [`${"[".repeat(JSON_DEPTH_LIMIT + 1)}${"]".repeat(JSON_DEPTH_LIMIT + 1)}`, '{"a":"x\ud800"}', '{"\udfff":1}', "{", ""];
    for (const text of cases) {
      let error: unknown;
      try {
        parseJsonText(text);
      } catch (e) {
        error = e;
      }
      expect(error, text.slice(0, 40)).toBeInstanceOf(MalformedBodyError);
      const res = errorResponse(error);
      expect(res.status).toBe(400);
      expect((await res.json()).fieldErrors.body).toHaveLength(1);
    }
  });
});
