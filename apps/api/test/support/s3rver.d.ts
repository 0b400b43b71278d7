/** Minimal types for s3rver 3.7.1 (a local S3 fake for the tests; it ships none). */
declare module 's3rver' {
  import type { AddressInfo } from 'node:net';
  export default class S3rver {
    constructor(opts: Record<string, unknown>);
    run(): Promise<AddressInfo>;
    close(): Promise<void>;
  }
}
