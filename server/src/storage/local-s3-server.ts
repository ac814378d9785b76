import { mkdirSync } from 'node:fs';
import S3rver from 's3rver';

/**
 * Credentials s3rver accepts: it checks signatures against this one fixed key pair (s3rver 3.7
 * `lib/models/account.js`, its dummy account). Local fake only; a real service takes S3_ACCESS_KEY_ID / S3_SECRET_ACCESS_KEY.
 */
export const localS3Credentials = { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' } as const;

export interface LocalS3ServerOptions {
  /** Folder for the buckets (created when missing). */
  directory: string;
  /** Bucket to create at start (kept when it exists). */
  bucket: string;
  /** TCP port on 127.0.0.1; 0 picks a free one. */
  port: number;
}

/** A running local fake S3 service. */
export interface LocalS3Server {
  /** Base URL, e.g. `http://127.0.0.1:40123`. */
  endpoint: string;
  port: number;
  close(): Promise<void>;
}

/**
 * Starts s3rver on 127.0.0.1 (never on a public interface: it accepts one well-known key pair) with the
 * bucket in place.
 *
 * @example
 * const fake = await startLocalS3Server({ directory: './data/s3', bucket: 'gramwatt-files', port: 0 });
 * // ... S3ObjectStore({ endpoint: fake.endpoint, ... })
 * await fake.close();
 */
export async function startLocalS3Server(options: LocalS3ServerOptions): Promise<LocalS3Server> {
  mkdirSync(options.directory, { recursive: true });
  const server = new S3rver({
    address: '127.0.0.1',
    port: options.port,
    directory: options.directory,
    silent: true,
    configureBuckets: [{ name: options.bucket, configs: [] }],
  });
  const address = await server.run();
  return {
    endpoint: `http://127.0.0.1:${address.port}`,
    port: address.port,
    close: () => server.close(),
  };
}
