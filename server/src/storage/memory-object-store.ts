import type { ObjectStore, StoredObject } from './object-store';

/** An {@link ObjectStore} in a Map: for tests and `STORAGE_DRIVER=memory`. Copies bytes in and out. */
export class MemoryObjectStore implements ObjectStore {
  private readonly objects = new Map<string, StoredObject>();

  async put(key: string, body: Buffer, contentType: string): Promise<void> {
    this.objects.set(key, { body: Buffer.from(body), contentType });
  }

  async get(key: string): Promise<StoredObject | undefined> {
    const found = this.objects.get(key);
    return found && { body: Buffer.from(found.body), contentType: found.contentType };
  }

  async delete(key: string): Promise<void> {
    this.objects.delete(key);
  }

  /** The keys held now, sorted (tests check what was stored or removed). */
  keys(): string[] {
    return [...this.objects.keys()].sort();
  }
}
