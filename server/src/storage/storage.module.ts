import { Inject, Logger, Module, type OnApplicationShutdown } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { type StorageConfig, storageConfigKey } from '../config';
import { localS3Credentials, startLocalS3Server } from './local-s3-server';
import { MemoryObjectStore } from './memory-object-store';
import { OBJECT_STORE, type ObjectStore } from './object-store';
import { S3ObjectStore } from './s3-object-store';

/** The store the app uses and how to let go of it (stop the fake, close sockets). */
export interface StorageHandle {
  store: ObjectStore;
  close(): Promise<void>;
}

const STORAGE_HANDLE = Symbol('STORAGE_HANDLE');

/**
 * Opens the store the config names: memory; a real S3-compatible service; or the local fake, started here
 * on 127.0.0.1 with its files in `<DATA_DIR>/s3` and the bucket created.
 */
export async function openStorage(config: StorageConfig, logger = new Logger('Storage')): Promise<StorageHandle> {
  if (config.driver === 'memory') {
    logger.log('Keeping item files in memory (STORAGE_DRIVER=memory): they are lost at shutdown');
    return { store: new MemoryObjectStore(), close: async () => undefined };
  }
  if (config.mode === 'remote') {
    const store = new S3ObjectStore(config.s3);
    logger.log(`Storing item files in bucket ${config.s3.bucket} at ${config.s3.endpoint}`);
    return { store, close: async () => store.destroy() };
  }
  const fake = await startLocalS3Server({ directory: config.fakeDir, bucket: config.bucket, port: config.fakePort });
  const store = new S3ObjectStore({
    endpoint: fake.endpoint,
    bucket: config.bucket,
    region: config.region,
    forcePathStyle: true,
    checksumsWhenRequired: true,
    ...localS3Credentials,
  });
  logger.log(`Local fake S3 on ${fake.endpoint}, bucket ${config.bucket}, files in ${config.fakeDir}`);
  return {
    store,
    close: async () => {
      store.destroy();
      await fake.close();
    },
  };
}

/** Stops the fake S3 service and closes the client when the app shuts down. */
export class StorageLifecycle implements OnApplicationShutdown {
  constructor(@Inject(STORAGE_HANDLE) private readonly handle: StorageHandle) {}

  async onApplicationShutdown(): Promise<void> {
    await this.handle.close();
  }
}

/**
 * Provides `OBJECT_STORE` from the `storage` config: the local fake S3 (started with the app) by default,
 * a real service when S3_ENDPOINT is set, memory under NODE_ENV=test. Tests may override `OBJECT_STORE`.
 */
@Module({
  providers: [
    {
      provide: STORAGE_HANDLE,
      inject: [ConfigService],
      useFactory: (config: ConfigService) => openStorage(config.getOrThrow<StorageConfig>(storageConfigKey)),
    },
    { provide: OBJECT_STORE, inject: [STORAGE_HANDLE], useFactory: (handle: StorageHandle) => handle.store },
    {
      provide: StorageLifecycle,
      inject: [STORAGE_HANDLE],
      useFactory: (handle: StorageHandle) => new StorageLifecycle(handle),
    },
  ],
  exports: [OBJECT_STORE],
})
export class StorageModule {}
