/**
 * Where uploaded photos' bytes live: outside the database, behind this small
 * interface, so a bucket or another disk can replace the local one without
 * touching the services. Keys are opaque random names chosen by the storage.
 */
export interface PhotoStorage {
  /** Stores the bytes and returns the new key, e.g. "3f9c…e1.jpg". */
  put(bytes: Buffer, extension: string): Promise<string>;
  /** The bytes under `key`, or null when there are none. */
  get(key: string): Promise<Buffer | null>;
  /** Removes `key`; removing a missing key is not an error. */
  remove(key: string): Promise<void>;
}
