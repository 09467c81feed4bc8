/** The parts of s3rver (a local fake S3 server) the tests use; the package ships no types. */
declare module 's3rver' {
  interface S3rverOptions {
    address?: string;
    port?: number;
    silent?: boolean;
    directory: string;
    configureBuckets?: Array<{ name: string; configs: unknown[] }>;
  }
  export default class S3rver {
    constructor(options: S3rverOptions);
    run(): Promise<{ address: string; port: number }>;
    close(): Promise<void>;
  }
}
