// The few parts of s3rver 3.7 (it ships no types) that scripts/s3-fake.ts uses.
declare module "s3rver" {
  import type { AddressInfo } from "node:net";

  interface S3rverOptions {
    address?: string;
    port?: number;
    directory?: string;
    silent?: boolean;
    resetOnClose?: boolean;
    configureBuckets?: { name: string; configs?: (string | Buffer)[] }[];
  }

  export default class S3rver {
    constructor(options: S3rverOptions);
    run(): Promise<AddressInfo>;
    close(): Promise<void>;
  }
}
