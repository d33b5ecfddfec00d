import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { get, type IncomingHttpHeaders, type Server } from "node:http";
import type { AddressInfo } from "node:net";
import { tmpdir } from "node:os";
import path from "node:path";
import { brotliCompressSync, gzipSync } from "node:zlib";
import compression from "compression";
import express from "express";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { precompressedAssets } from "@server/http/precompressed-assets.ts";

const SCRIPT = "export const answer = 42; // ".padEnd(4000, "x");
const CACHE = "public, max-age=31536000, immutable";

/** The raw bytes and headers of one answer, undecoded (fetch and supertest would decode them). */
function rawGet(
  server: Server,
  file: string,
  acceptEncoding: string,
): Promise<{ status: number; headers: IncomingHttpHeaders; body: Buffer }> {
  const { port } = server.address() as AddressInfo;
  return new Promise((resolve, reject) => {
    get(
      { host: "127.0.0.1", port, path: `/assets/${file}`, headers: { "Accept-Encoding": acceptEncoding } },
      (response) => {
        const chunks: Buffer[] = [];
        response.on("data", (chunk: Buffer) => chunks.push(chunk));
        response.on("end", () =>
          resolve({ status: response.statusCode ?? 0, headers: response.headers, body: Buffer.concat(chunks) }),
        );
      },
    ).on("error", reject);
  });
}

describe("precompressedAssets", () => {
  let folder: string;
  let server: Server;
  beforeAll(async () => {
    folder = mkdtempSync(path.join(tmpdir(), "satura-assets-"));
    writeFileSync(path.join(folder, "screen-abc.js"), SCRIPT);
    writeFileSync(path.join(folder, "screen-abc.js.br"), brotliCompressSync(SCRIPT));
    writeFileSync(path.join(folder, "screen-abc.js.gz"), gzipSync(SCRIPT));
    writeFileSync(path.join(folder, "plain-abc.js"), SCRIPT);
    // As in server/app.ts: the compression middleware first, the static handler after.
    const app = express();
    app.use(compression());
    app.use("/assets", precompressedAssets(folder, CACHE));
    app.use("/assets", express.static(folder));
    server = app.listen(0, "127.0.0.1");
    await new Promise((resolve) => server.once("listening", resolve));
  });
  afterAll(() => {
    server.close();
    rmSync(folder, { recursive: true, force: true });
  });

  it("sends the brotli copy as it is when the browser takes brotli", async () => {
    const answer = await rawGet(server, "screen-abc.js", "gzip, deflate, br");
    expect(answer.status).toBe(200);
    expect(answer.headers["content-encoding"]).toBe("br");
    expect(answer.headers["content-type"]).toBe("text/javascript; charset=utf-8");
    expect(answer.headers["cache-control"]).toBe(CACHE);
    expect(answer.headers.vary).toContain("Accept-Encoding");
    expect(answer.body.equals(brotliCompressSync(SCRIPT))).toBe(true);
  });

  it("sends the gzip copy when the browser takes gzip only", async () => {
    const answer = await rawGet(server, "screen-abc.js", "gzip");
    expect(answer.headers["content-encoding"]).toBe("gzip");
    expect(answer.body.equals(gzipSync(SCRIPT))).toBe(true);
  });

  it("leaves the file to the static handler when the browser takes no encoding, or there is no copy", async () => {
    const identity = await rawGet(server, "screen-abc.js", "identity");
    expect(identity.headers["content-encoding"]).toBeUndefined();
    expect(identity.body.toString()).toBe(SCRIPT);
    // Without a copy the compression middleware compresses it on the way out, as before.
    const noCopy = await rawGet(server, "plain-abc.js", "gzip");
    expect(noCopy.headers["content-encoding"]).toBe("gzip");
  });
});
