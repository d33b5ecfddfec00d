import { constants } from "node:fs";
import { access, mkdir, readFile, rm, writeFile } from "node:fs/promises";
import { join } from "node:path";
import type { PhotoStore } from "./photo-store.ts";

const isMissing = (error: unknown) => (error as NodeJS.ErrnoException | null)?.code === "ENOENT";

/**
 * Photos as files in one folder, each under its own name: the layout Satura has always used,
 * so a folder written by an earlier version reads as it is. The content type is not kept: the
 * photo's row in the database holds it.
 */
export function createLocalPhotoStore(folder: string): PhotoStore {
  return {
    description: `local folder ${folder}`,
    async put(name, bytes) {
      await mkdir(folder, { recursive: true });
      await writeFile(join(folder, name), bytes);
    },
    async get(name) {
      try {
        return await readFile(join(folder, name));
      } catch (error) {
        if (isMissing(error)) return null;
        throw error;
      }
    },
    async delete(name) {
      await rm(join(folder, name), { force: true });
    },
    async check() {
      try {
        await mkdir(folder, { recursive: true });
        await access(folder, constants.R_OK | constants.W_OK);
      } catch (error) {
        const code = (error as NodeJS.ErrnoException).code ?? String(error);
        throw new Error(`photo folder ${folder} cannot be written (${code})`, { cause: error });
      }
    },
    close() {},
  };
}
