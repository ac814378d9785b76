import {
  DeleteObjectCommand,
  GetObjectCommand,
  NoSuchKey,
  PutObjectCommand,
  S3Client,
  S3ServiceException,
} from '@aws-sdk/client-s3';
import type { S3Settings } from '../config';
import type { ObjectStore, StoredObject } from './object-store';

export interface S3ObjectStoreOptions extends S3Settings {
  /**
   * Compute and check payload checksums only where an operation requires them. Needed for the local fake:
   * with the SDK's default (`WHEN_SUPPORTED`) uploads go out with aws-chunked framing, which s3rver stores
   * as-is, silently corrupting the object.
   */
  checksumsWhenRequired?: boolean;
}

/** Builds the SDK client for an S3-compatible service. */
export function createS3Client(options: S3ObjectStoreOptions): S3Client {
  return new S3Client({
    endpoint: options.endpoint,
    region: options.region,
    forcePathStyle: options.forcePathStyle,
    credentials: { accessKeyId: options.accessKeyId, secretAccessKey: options.secretAccessKey },
    ...(options.checksumsWhenRequired
      ? { requestChecksumCalculation: 'WHEN_REQUIRED', responseChecksumValidation: 'WHEN_REQUIRED' }
      : {}),
  });
}

/** An {@link ObjectStore} over one bucket of an S3-compatible service, through `@aws-sdk/client-s3`. */
export class S3ObjectStore implements ObjectStore {
  private readonly client: S3Client;
  private readonly bucket: string;

  constructor(options: S3ObjectStoreOptions) {
    this.client = createS3Client(options);
    this.bucket = options.bucket;
  }

  async put(key: string, body: Buffer, contentType: string): Promise<void> {
    await this.client.send(
      new PutObjectCommand({
        Bucket: this.bucket,
        Key: key,
        Body: body,
        ContentType: contentType,
        ContentLength: body.length,
      }),
    );
  }

  async get(key: string): Promise<StoredObject | undefined> {
    try {
      const result = await this.client.send(new GetObjectCommand({ Bucket: this.bucket, Key: key }));
      if (!result.Body) return undefined;
      const bytes = await result.Body.transformToByteArray();
      return { body: Buffer.from(bytes), contentType: result.ContentType ?? 'application/octet-stream' };
    } catch (error) {
      if (error instanceof NoSuchKey) return undefined;
      if (error instanceof S3ServiceException && error.$metadata.httpStatusCode === 404) return undefined;
      throw error;
    }
  }

  async delete(key: string): Promise<void> {
    await this.client.send(new DeleteObjectCommand({ Bucket: this.bucket, Key: key }));
  }

  /** Closes the client's sockets. */
  destroy(): void {
    this.client.destroy();
  }
}
