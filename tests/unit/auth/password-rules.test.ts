import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { ARGON2_PARAMS, passwordProblem } from "@/lib/auth/password-rules";
import { signUpSchema } from "@/lib/validation/auth";

describe("password rules (ASVS 6.2: 8–256 characters, no composition rules, common ones refused)", () => {
  it("uses the OWASP minimum argon2id parameters", () => {
    expect(ARGON2_PARAMS).toMatchObject({ algorithm: 2, memoryCost: 19456, timeCost: 2, parallelism: 1 });
  });

  it("refuses short, overlong and common passwords", () => {
    expect(passwordProblem("short")).toMatch(/at least 8/);
    expect(passwordProblem("x".repeat(257))).toMatch(/at most 256/);
    expect(passwordProblem("password123")).toMatch(/commonly used/);
    expect(passwordProblem("Qwertyuiop")).toMatch(/commonly used/);
  });

  it("accepts any long-enough uncommon password, whatever its characters", () => {
    expect(passwordProblem("bellows and tongs")).toBeNull();
    expect(passwordProblem("ハンマーと金床です")).toBeNull();
    fc.assert(
      fc.property(fc.string({ minLength: 8, maxLength: 64, unit: "grapheme" }), (pw) => {
        const problem = passwordProblem(pw);
        return problem === null || /commonly used|at least|at most/.test(problem);
      }),
    );
  });

  it("counts characters, not UTF-16 units", () => {
    expect(passwordProblem("🔨🔨🔨🔨🔨🔨🔨")).toMatch(/at least 8/);
    expect(passwordProblem("🔨🔨🔨🔨🔨🔨🔨🔨")).toBeNull();
  });
});

describe("sign-up schema", () => {
  const good = { displayName: "Ada Forge", email: "ada@example.com", password: "a long uncommon phrase" };

  it("accepts a good sign-up and trims the name", () => {
    expect(signUpSchema.parse({ ...good, displayName: "  Ada Forge " }).displayName).toBe("Ada Forge");
  });

  it("gives one message per bad field", () => {
    const result = signUpSchema.safeParse({ displayName: "", email: "nope", password: "12345678" });
    expect(result.success).toBe(false);
    const fields = result.error!.issues.map((i) => i.path[0]);
    expect(new Set(fields)).toEqual(new Set(["displayName", "email", "password"]));
  });

  it("refuses unknown keys (no mass assignment of role or shop)", () => {
    expect(signUpSchema.safeParse({ ...good, role: "manager" }).success).toBe(false);
  });
});
