import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { readStorageConfig } from './storage.config';

describe('storage config', () => {
  it('starts the local fake in DATA_DIR/s3 on a free port by default outside tests', () => {
    expect(readStorageConfig({ DATA_DIR: '/srv/gw' })).toEqual({
      driver: 's3',
      mode: 'local-fake',
      bucket: 'gramwatt-files',
      region: 'us-east-1',
      fakePort: 0,
      fakeDir: join(resolve('/srv/gw'), 's3'),
    });
    expect(readStorageConfig({ NODE_ENV: 'production', S3_FAKE_PORT: '4569' })).toMatchObject({
      mode: 'local-fake',
      fakePort: 4569,
    });
  });

  it('keeps files in memory under NODE_ENV=test unless told otherwise', () => {
    expect(readStorageConfig({ NODE_ENV: 'test' })).toEqual({ driver: 'memory' });
    expect(readStorageConfig({ NODE_ENV: 'test', STORAGE_DRIVER: 's3' })).toMatchObject({
      driver: 's3',
      mode: 'local-fake',
    });
    expect(readStorageConfig({ STORAGE_DRIVER: 'memory' })).toEqual({ driver: 'memory' });
  });

  it('switches to a real service with S3_ENDPOINT and its keys', () => {
    const config = readStorageConfig({
      S3_ENDPOINT: 'https://objects.example.test',
      S3_BUCKET: 'gear-photos',
      S3_REGION: 'eu-central-1',
      S3_ACCESS_KEY_ID: 'id',
      S3_SECRET_ACCESS_KEY: 'secret',
      S3_FORCE_PATH_STYLE: 'false',
    });
    expect(config).toEqual({
      driver: 's3',
      mode: 'remote',
      s3: {
        endpoint: 'https://objects.example.test',
        bucket: 'gear-photos',
        region: 'eu-central-1',
        accessKeyId: 'id',
        secretAccessKey: 'secret',
        forcePathStyle: false,
      },
    });
  });

  it('refuses an endpoint without keys, naming each missing variable', () => {
    expect(() => readStorageConfig({ S3_ENDPOINT: 'http://127.0.0.1:9000' })).toThrow(
      /S3_ACCESS_KEY_ID: must be set with S3_ENDPOINT[\s\S]*S3_SECRET_ACCESS_KEY/,
    );
  });

  it.each([
    ['S3_BUCKET', 'ab'],
    ['S3_BUCKET', 'Upper-Case'],
    ['S3_ENDPOINT', 'ftp://files.example.test'],
    ['S3_FAKE_PORT', '70000'],
    ['STORAGE_DRIVER', 'disk'],
    ['S3_FORCE_PATH_STYLE', 'perhaps'],
  ])('rejects %s=%s, naming the variable', (name, value) => {
    expect(() => readStorageConfig({ [name]: value })).toThrow(new RegExp(name));
  });
});
