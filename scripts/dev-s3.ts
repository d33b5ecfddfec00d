/**
 * `npm run dev:s3`: development with photos in object storage. Starts a fake S3 (s3rver) on a
 * local port with its files under data/s3/, creates the bucket, prints the variables that point
 * Satura at it, then runs `npm run dev`'s server with them. `-- --fake-only` starts the fake and
 * prints the variables without the server (to start it another way, or a second app server).
 *
 * S3RVER_PORT picks the port (default 4568, s3rver's own); S3_BUCKET the bucket (satura-photos).
 */
import { spawn } from "node:child_process";
import { mkdir } from "node:fs/promises";
import { startFakeS3 } from "./fake-s3.ts";

const directory = "data/s3";
const port = Number(process.env.S3RVER_PORT ?? 4568);
const bucket = process.env.S3_BUCKET ?? "satura-photos";
const fakeOnly = process.argv.includes("--fake-only");

await mkdir(directory, { recursive: true });
const fake = await startFakeS3({ directory, bucket, port });
console.log(`Fake S3 (s3rver) on ${fake.endpoint}, bucket "${bucket}", files in ${directory}/`);
console.log("Start Satura against it with:\n");
console.log(
  Object.entries(fake.env)
    .map(([name, value]) => `  ${name}=${value}`)
    .join(" \\\n"),
);
console.log();

if (fakeOnly) {
  console.log("Press Ctrl-C to stop the fake.");
  const stop = () => void fake.close().then(() => process.exit(0));
  process.on("SIGINT", stop);
  process.on("SIGTERM", stop);
} else {
  // The same command as `npm run dev`, with the fake's variables added to this environment.
  const server = spawn("tsx", ["watch", "server/index.ts"], {
    stdio: "inherit",
    env: { ...process.env, ...fake.env },
  });
  // Ctrl-C reaches the server too (same process group): wait for it to stop, then stop the fake.
  process.on("SIGINT", () => undefined);
  process.on("SIGTERM", () => server.kill("SIGTERM"));
  server.on("exit", (code) => void fake.close().then(() => process.exit(code ?? 0)));
}
