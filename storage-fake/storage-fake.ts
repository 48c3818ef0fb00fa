import S3rver from 's3rver';

export interface StorageFakeOptions {
  port: number;
  directory: string;
  buckets?: string[];
}

// A local S3-compatible store (s3rver) on loopback, for development and tests only.
export async function startStorageFake(opts: StorageFakeOptions): Promise<{ port: number; close: () => Promise<void> }> {
  const server = new S3rver({
    address: '127.0.0.1',
    port: opts.port,
    silent: true,
    directory: opts.directory,
    configureBuckets: (opts.buckets ?? []).map((name) => ({ name })),
  });
  const { port } = await server.run();
  return { port, close: () => server.close() };
}
