import { setTimeout as sleep } from "node:timers/promises";
import compression from "compression";
import express from "express";
import request from "supertest";
import { describe, expect, it } from "vitest";
import { streamPieces } from "@server/http/stream-pieces.ts";

/** An app answering with pieces that take `gapMs` each to make, behind the compression middleware as the API is. */
function appWithSlowPieces(pieces: readonly string[], gapMs: number, made: number[]) {
  const app = express();
  app.use(compression());
  app.get("/slow", async (_req, res) => {
    res.setHeader("Content-Type", "text/csv; charset=utf-8");
    async function* source() {
      for (const [index, piece] of pieces.entries()) {
        if (index > 0) await sleep(gapMs);
        made.push(performance.now());
        yield piece;
      }
    }
    await streamPieces(res, source());
  });
  return app;
}

describe("streamPieces", () => {
  // The compression middleware holds output until it has 16 kB; a header line waiting behind a
  // slow database read would reach nobody until the whole download was nearly made.
  it("delivers each piece through the compression before the next one is made", async () => {
    const made: number[] = [];
    const arrived: { at: number; text: string }[] = [];
    const pieces = ["date,kind,kg\r\n", "2026-12-03,recovered,1.2\r\n", "2026-12-03,added,0.4\r\n"];
    const response = await request(appWithSlowPieces(pieces, 150, made))
      .get("/slow")
      .set("Accept-Encoding", "gzip")
      .buffer(true)
      .parse((res, done) => {
        res.setEncoding("utf8");
        res.on("data", (text: string) => arrived.push({ at: performance.now(), text }));
        res.on("end", () => done(null, arrived.map((piece) => piece.text).join("")));
      });
    expect(response.headers["content-encoding"]).toBe("gzip");
    expect(response.body).toBe(pieces.join(""));
    expect(arrived.map((piece) => piece.text)).toEqual(pieces);
    // Each piece reached the client before its successor was made.
    for (let index = 1; index < pieces.length; index += 1) expect(arrived[index - 1]!.at).toBeLessThan(made[index]!);
  });

  it("stops reading the source when the answer cannot be finished", async () => {
    let finished = false;
    const app = express();
    app.get("/failing", async (_req, res) => {
      async function* source() {
        try {
          yield "first line\r\n";
          throw new Error("the database went away");
        } finally {
          finished = true;
        }
      }
      await streamPieces(res, source()).catch(() => undefined);
    });
    // The answer is cut short: the client sees an aborted download, not a file that looks whole.
    await expect(request(app).get("/failing")).rejects.toThrow();
    expect(finished).toBe(true);
  });
});
