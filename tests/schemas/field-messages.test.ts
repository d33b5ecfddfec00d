import { describe, expect, it } from "vitest";
import { z } from "zod";
import { FORM_MESSAGE_KEY, fieldMessages } from "@shared/schemas/field-messages.ts";

const Schema = z
  .strictObject({
    volts: z.array(z.number({ error: "Volts must be a number" }).min(0, "Volts cannot be negative")),
    note: z.string().min(3, "Write a note"),
  })
  .refine((body) => body.volts.length > 0, { message: "Enter one voltage at least" });

describe("fieldMessages", () => {
  it("keeps the first message per field path, a form-wide one under its own key, and names unknown fields", () => {
    const parsed = Schema.safeParse({ volts: [230, -1], note: "", extra: 1 });
    expect(parsed.success).toBe(false);
    expect(fieldMessages(parsed.error!)).toEqual({
      "volts.1": "Volts cannot be negative",
      note: "Write a note",
      extra: expect.any(String),
    });
    const empty = Schema.safeParse({ volts: [], note: "fine" });
    expect(fieldMessages(empty.error!)).toEqual({ [FORM_MESSAGE_KEY]: "Enter one voltage at least" });
  });
});
