/**
 * The photo store is down (503): no photo can be sent now, so the queue stops and retries later.
 * Apart from the upload, which loads only when a photo waits, so that every sync can name it.
 */
export class PhotoStoreUnavailableError extends Error {
  constructor(serverMessage: string) {
    super(serverMessage);
    this.name = 'PhotoStoreUnavailableError';
  }
}
