import { createServer } from "node:net";

/**
 * A local port nothing listens on right now, the kernel's pick: for a throwaway PostgreSQL, an
 * app server the bench starts, or a fake. Another process could take it before it is used, which
 * the callers accept (they start their server at once and fail loudly if the port is gone).
 */
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = createServer();
    probe.once("error", reject);
    probe.listen(0, "127.0.0.1", () => {
      const address = probe.address();
      probe.close(() =>
        typeof address === "object" && address ? resolve(address.port) : reject(new Error("no free port")),
      );
    });
  });
}
