// s3rver ships no type declarations; these cover the part Foldwright uses.
declare module "s3rver" {
  interface S3rverOptions {
    address?: string;
    port?: number;
    directory: string;
    silent?: boolean;
  }
  export default class S3rver {
    constructor(options: S3rverOptions);
    run(): Promise<{ address: string; port: number }>;
    close(): Promise<void>;
  }
}
