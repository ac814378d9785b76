/** An object as stored: its bytes and the content type it was stored with. */
export interface StoredObject {
  body: Buffer;
  contentType: string;
}

/**
 * Where item files live, by key. The app uses an S3-compatible bucket (a real service or the local fake);
 * tests may use {@link MemoryObjectStore}. Keys are opaque to callers outside the files module.
 */
export interface ObjectStore {
  /** Stores `body` under `key`, replacing any object there. */
  put(key: string, body: Buffer, contentType: string): Promise<void>;
  /** The object under `key`, or undefined when there is none. */
  get(key: string): Promise<StoredObject | undefined>;
  /** Removes the object under `key`; removing a missing key is not an error. */
  delete(key: string): Promise<void>;
}

/** Injection token of the app's {@link ObjectStore}. */
export const OBJECT_STORE = Symbol('OBJECT_STORE');
