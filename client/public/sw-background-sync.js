// Loaded into the generated service worker (vite.config.ts, workbox.importScripts).
// When the browser's background sync fires for the outbox tag, the open Breakline pages are told
// to sync and the worker waits for their answer; if none got through, the event fails and the
// browser tries again later on its own schedule. The worker does not sync by itself: the access
// token lives in the page's storage, which a worker cannot read, so with no page open the outbox
// waits for the app to start (it syncs on start).
/* eslint-env serviceworker */
const BREAKLINE_SYNC_TAG = 'breakline-outbox';
const BREAKLINE_SYNC_MESSAGE = 'breakline:sync';
// A long sync of a large club takes well under this; a page that never answers must not hold the event.
const BREAKLINE_ANSWER_WAIT_MS = 3 * 60 * 1000;

function askPageToSync(client) {
  return new Promise((resolve) => {
    const channel = new MessageChannel();
    const timer = setTimeout(() => resolve(false), BREAKLINE_ANSWER_WAIT_MS);
    channel.port1.onmessage = (event) => {
      clearTimeout(timer);
      resolve(Boolean(event.data && event.data.ok));
    };
    client.postMessage({ type: BREAKLINE_SYNC_MESSAGE }, [channel.port2]);
  });
}

async function syncOpenPages(lastChance) {
  const pages = await self.clients.matchAll({ type: 'window', includeUncontrolled: true });
  if (pages.length === 0) return;
  const answers = await Promise.all(pages.map(askPageToSync));
  if (!answers.includes(true) && !lastChance) throw new Error('No open page could send the outbox; the browser will try again.');
}

self.addEventListener('sync', (event) => {
  if (event.tag !== BREAKLINE_SYNC_TAG) return;
  event.waitUntil(syncOpenPages(event.lastChance));
});
