/**
 * Asks the browser not to evict the device store under storage pressure: unsynced records
 * and photos must survive until they reach the server. Returns whether storage is persistent.
 */
export async function requestPersistentStorage(): Promise<boolean> {
  if (!navigator.storage?.persist) return false;
  if (await navigator.storage.persisted()) return true;
  return navigator.storage.persist();
}
