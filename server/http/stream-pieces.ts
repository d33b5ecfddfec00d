/**
 * Writes an answer piece by piece as its source makes them, each piece sent on at once: the
 * compression middleware would otherwise hold the text back until it had 16 kB of compressed
 * output, so a download would show nothing while its first lines were long ready. Back-pressure
 * is kept (a slow link holds the source back), and a closed connection stops the source.
 */
import { once } from "node:events";
import type { Response } from "express";

export async function streamPieces(res: Response, pieces: AsyncIterable<string>): Promise<void> {
  const source = pieces[Symbol.asyncIterator]();
  try {
    for (let next = await source.next(); !next.done; next = await source.next()) {
      if (res.destroyed) throw new Error("the connection closed before the answer was sent");
      const flowing = res.write(next.value);
      // Set by the compression middleware; absent when the answer is not compressed.
      res.flush?.();
      if (!flowing) await Promise.race([once(res, "drain"), once(res, "close")]);
    }
    res.end();
  } catch (error) {
    // Cut short, never ended: a partial file must fail as a download, not look whole.
    res.destroy();
    throw error;
  } finally {
    await source.return?.();
  }
}
