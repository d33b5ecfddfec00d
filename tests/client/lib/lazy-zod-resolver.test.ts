import { describe, expect, it } from "vitest";
import { SignInSchema } from "@shared/schemas/auth.ts";
import { lazyZodResolver } from "@/lib/lazy-zod-resolver.ts";

const options = { fields: {}, shouldUseNativeValidation: false } as const;

describe("lazyZodResolver", () => {
  it("loads the schema once, on the first check", async () => {
    let loads = 0;
    const resolver = lazyZodResolver(async () => {
      loads += 1;
      return SignInSchema;
    });
    expect(loads).toBe(0);
    await resolver({ email: "tech@bellbird.example", password: "x" }, undefined, options);
    await resolver({ email: "", password: "" }, undefined, options);
    expect(loads).toBe(1);
  });

  it("answers as the shared schema does: the values when valid, its messages when not", async () => {
    const resolver = lazyZodResolver(async () => SignInSchema);
    const valid = await resolver(
      { email: "tech@bellbird.example", password: "bellbird-demo-2026" },
      undefined,
      options,
    );
    expect(valid.errors).toEqual({});
    expect(valid.values).toEqual({ email: "tech@bellbird.example", password: "bellbird-demo-2026" });

    const invalid = await resolver({ email: "not an address", password: "" }, undefined, options);
    const expected = SignInSchema.safeParse({ email: "not an address", password: "" });
    expect(expected.success).toBe(false);
    const messages = Object.fromEntries(expected.error!.issues.map((issue) => [issue.path[0], issue.message]));
    expect(invalid.errors.email?.message).toBe(messages.email);
    expect(invalid.errors.password?.message).toBe(messages.password);
  });
});
