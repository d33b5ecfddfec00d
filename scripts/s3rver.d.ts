/** The part of s3rver 3 (no types of its own) that scripts/fake-s3.ts uses. */
declare module "s3rver" {
  import type { AddressInfo } from "node:net";

  interface S3rverOptions {
    address?: string;
    port?: number;
    /** Buckets and objects are files under this folder. */
    directory?: string;
    silent?: boolean;
    resetOnClose?: boolean;
    /** Buckets created (if missing) before the server listens. */
    configureBuckets?: { name: string; configs?: string[] }[];
  }

  export default class S3rver {
    constructor(options?: S3rverOptions);
    run(): Promise<AddressInfo>;
    close(): Promise<void>;
  }
}
