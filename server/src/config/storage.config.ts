import { join } from 'node:path';
import { registerAs } from '@nestjs/config';
import { z } from 'zod';
import { type Env, envFlagSchema, parseEnv, readDataDir, readNodeEnv } from './env';

/** Folder inside the data folder where the local fake S3 service keeps its buckets. */
export const localS3DirName = 's3';

/** Bucket used when S3_BUCKET is unset. */
export const defaultS3Bucket = 'gramwatt-files';

/** Region used when S3_REGION is unset (the fake ignores it; most S3-compatible services accept it). */
export const defaultS3Region = 'us-east-1';

/** Where item files go: an S3-compatible bucket (the local fake unless S3_ENDPOINT is set), or memory (tests). */
export const storageDrivers = ['s3', 'memory'] as const;
export type StorageDriver = (typeof storageDrivers)[number];

/**
 * S3 bucket naming rules, simplified: 3–63 characters, lower-case letters, digits, dots and hyphens,
 * starting and ending with a letter or digit (Amazon S3 User Guide, "Bucket naming rules").
 */
const bucketNamePattern = /^[a-z0-9][a-z0-9.-]{1,61}[a-z0-9]$/;

const storageEnvSchema = z
  .object({
    STORAGE_DRIVER: z.enum(storageDrivers, { error: `use ${storageDrivers.join(' or ')}` }).optional(),
    S3_ENDPOINT: z
      .url({ protocol: /^https?$/, error: 'must be an http:// or https:// URL (leave unset for the local fake)' })
      .optional(),
    S3_BUCKET: z
      .string()
      .regex(bucketNamePattern, { error: 'must be 3–63 lower-case letters, digits, dots or hyphens' })
      .default(defaultS3Bucket),
    S3_REGION: z
      .string()
      .regex(/^[a-z0-9-]+$/, { error: 'use lower-case letters, digits and hyphens' })
      .default(defaultS3Region),
    S3_ACCESS_KEY_ID: z.string().optional(),
    S3_SECRET_ACCESS_KEY: z.string().optional(),
    S3_FORCE_PATH_STYLE: envFlagSchema.default(true),
    S3_FAKE_PORT: z.coerce
      .number({ error: 'must be a number' })
      .int({ error: 'must be a whole number' })
      .min(0, { error: 'must be 0–65535 (0 picks a free port)' })
      .max(65535, { error: 'must be 0–65535 (0 picks a free port)' })
      .default(0),
  })
  .superRefine((env, ctx) => {
    if (env.S3_ENDPOINT === undefined) return;
    for (const key of ['S3_ACCESS_KEY_ID', 'S3_SECRET_ACCESS_KEY'] as const) {
      if (env[key] === undefined)
        ctx.addIssue({ code: 'custom', path: [key], message: 'must be set with S3_ENDPOINT' });
    }
  });

/** How to reach an S3-compatible service. */
export interface S3Settings {
  /** Base URL of the service (S3_ENDPOINT). */
  endpoint: string;
  bucket: string;
  region: string;
  accessKeyId: string;
  secretAccessKey: string;
  /** Bucket in the path rather than the host name (S3_FORCE_PATH_STYLE, default true: what most self-hosted services need). */
  forcePathStyle: boolean;
}

/** The `storage` configuration namespace. */
export type StorageConfig =
  /** A real S3-compatible service named by S3_ENDPOINT; no fake is started. */
  | { driver: 's3'; mode: 'remote'; s3: S3Settings }
  /** The local fake (s3rver) started with the app on 127.0.0.1, files in `<DATA_DIR>/s3`. */
  | { driver: 's3'; mode: 'local-fake'; bucket: string; region: string; fakePort: number; fakeDir: string }
  /** Files kept in memory and lost at shutdown: the default under NODE_ENV=test. */
  | { driver: 'memory' };

export const storageConfigKey = 'storage';

/**
 * Reads and validates the `storage` namespace from `env`. STORAGE_DRIVER defaults to `memory` under
 * NODE_ENV=test (so test apps write nothing to disk) and to `s3` otherwise.
 */
export function readStorageConfig(env: Env): StorageConfig {
  const parsed = parseEnv(storageEnvSchema, env, 'storage');
  const driver = parsed.STORAGE_DRIVER ?? (readNodeEnv(env) === 'test' ? 'memory' : 's3');
  if (driver === 'memory') return { driver };
  if (parsed.S3_ENDPOINT !== undefined) {
    return {
      driver,
      mode: 'remote',
      s3: {
        endpoint: parsed.S3_ENDPOINT,
        bucket: parsed.S3_BUCKET,
        region: parsed.S3_REGION,
        // Both are present: the refinement above requires them with S3_ENDPOINT.
        accessKeyId: parsed.S3_ACCESS_KEY_ID ?? '',
        secretAccessKey: parsed.S3_SECRET_ACCESS_KEY ?? '',
        forcePathStyle: parsed.S3_FORCE_PATH_STYLE,
      },
    };
  }
  return {
    driver,
    mode: 'local-fake',
    bucket: parsed.S3_BUCKET,
    region: parsed.S3_REGION,
    fakePort: parsed.S3_FAKE_PORT,
    fakeDir: join(readDataDir(env), localS3DirName),
  };
}

/** `registerAs` factory for the `storage` namespace over a given environment. */
export const storageConfig = (env: Env) => registerAs(storageConfigKey, () => readStorageConfig(env));
