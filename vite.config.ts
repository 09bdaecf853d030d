import { fileURLToPath } from 'node:url';
import react from '@vitejs/plugin-react';
import type { Plugin } from 'vite';
import { VitePWA } from 'vite-plugin-pwa';
import { defineConfig } from 'vitest/config';

// Paths are absolute because the client scripts run Vite from client/ with
// --config ../vite.config.ts, and a relative `root` would resolve against the cwd.
const clientDir = fileURLToPath(new URL('./client', import.meta.url));
const srcDir = fileURLToPath(new URL('./client/src', import.meta.url));
const apiProxy = { '/api': { target: 'http://127.0.0.1:3000', changeOrigin: false } };

// Our palette (client/src/app/palette.ts holds the same values for the UI).
const navy = '#0E2A47';
const sand = '#F4EBDD';

const pwa = VitePWA({
  registerType: 'prompt',
  injectRegister: false, // registered by client/src/app/pwa.ts with workbox-window
  // The glob below already precaches public/ (icons included); listing them again would duplicate entries.
  includeManifestIcons: false,
  manifest: {
    id: '/',
    name: 'Breakline',
    short_name: 'Breakline',
    description: 'Checks, trips and defects for inflatable rescue boats, on the beach and offline.',
    lang: 'en',
    start_url: '/',
    scope: '/',
    display: 'standalone',
    theme_color: navy,
    background_color: sand,
    icons: [
      { src: '/icons/icon-192.png', sizes: '192x192', type: 'image/png', purpose: 'any' },
      { src: '/icons/icon-512.png', sizes: '512x512', type: 'image/png', purpose: 'any' },
      { src: '/icons/icon-maskable-512.png', sizes: '512x512', type: 'image/png', purpose: 'maskable' },
    ],
  },
  workbox: {
    // The plugin adds the web manifest itself. Fonts as woff2 only: every browser with service
    // workers reads it, and the .woff copies would double the font bytes on a phone.
    globPatterns: ['**/*.{js,css,html,svg,png,woff2}'],
    navigateFallback: 'index.html',
    // The API must always reach the server (or fail plainly), never get the app shell back.
    navigateFallbackDenylist: [/^\/api\//],
    cleanupOutdatedCaches: true,
    // The background sync handler (client/public): the generated worker keeps precache and the
    // update prompt, and this adds the `sync` event that tells open pages to send the outbox.
    importScripts: ['/sw-background-sync.js'],
  },
});

// The two first screens: sign-in, and the signed-in shell with Today; and what both draw with.
const signInScreen = /client[\\/]src[\\/]app[\\/]pages[\\/]sign-in-page\.tsx$/;
const signedInScreen = /client[\\/]src[\\/]app[\\/]signed-in\.ts$/;
const sharedByFirstScreens =
  /@mui[\\/](material[\\/](Alert|IconButton|List|Paper|SvgIcon)|system[\\/]useThemeProps)[\\/]|client[\\/]src[\\/]features[\\/]auth[\\/]members[\\/]auth-lock\.ts$/;

/**
 * Fails the build when one first screen's chunk imports the other's: a signed-in phone would
 * load the sign-in screen, or the sign-in screen the local store and sync. The fix is to add
 * what they share to `sharedByFirstScreens`.
 */
const firstScreensApart: Plugin = {
  name: 'breakline:first-screens-apart',
  generateBundle(_options, bundle) {
    const chunks = Object.values(bundle).filter((c) => c.type === 'chunk');
    const [signIn, signedIn] = ['sign-in', 'signed-in'].map((name) => chunks.find((c) => c.name === name));
    if (!signIn || !signedIn) this.error('The sign-in or signed-in chunk is missing; see codeSplitting in vite.config.ts.');
    for (const [from, to] of [[signIn, signedIn], [signedIn, signIn]]) {
      if (!from.imports.includes(to.fileName)) continue;
      this.error(
        `The ${from.name} chunk (${from.fileName}) imports from the ${to.name} chunk (${to.fileName}). Add the ` +
          'modules both first screens use to sharedByFirstScreens in vite.config.ts.',
      );
    }
  },
};

export default defineConfig(({ mode }) => ({
  root: clientDir,
  resolve: {
    alias: [
      { find: '@', replacement: srcDir },
      // Dexie's own ES2018 build rather than its default entry, which wraps the ES5 bundle: 2 kB
      // less on Today. Everything that imports dexie must get the same copy (see test.server).
      { find: /^dexie$/, replacement: 'dexie/dist/modern/dexie.mjs' },
    ],
  },
  plugins: mode === 'test' ? [react()] : [react(), pwa, firstScreensApart],
  build: {
    outDir: fileURLToPath(new URL('./client/dist', import.meta.url)),
    emptyOutDir: true,
    // Preload hints only for the first screens' chunks: every other screen's chunks are in the
    // service worker's precache, and a hint list naming every chunk cost the first screen 3 kB.
    // Browsers without modulepreload (older Safari) just load the chunks without the hint.
    modulePreload: {
      polyfill: false,
      resolveDependencies: (filename, deps, { hostType }) =>
        hostType === 'html' || /(^|\/)(sign-in|signed-in)-[\w-]+\.js$/.test(filename) ? deps : [],
    },
    rolldownOptions: {
      output: {
        // A few chunks for the first screens instead of dozens of slivers: what every route needs
        // (the entry), what both first screens draw with (MUI's paper and alert), what the sign-in
        // screen adds (MUI's text field), and what the signed-in shell with Today adds (the local
        // store, sync, the record rules). Neither first screen loads the other's chunk. Other
        // screens split as the bundler sees fit.
        codeSplitting: {
          groups: [
            { name: 'core', tags: ['$initial'], priority: 4 },
            { name: 'first-screens', test: sharedByFirstScreens, priority: 3 },
            { name: 'sign-in', test: signInScreen, priority: 2 },
            { name: 'signed-in', test: signedInScreen, priority: 1 },
          ],
        },
      },
    },
  },
  server: { proxy: apiProxy },
  preview: { proxy: apiProxy },
  test: {
    environment: 'jsdom',
    // Relative to `root` (client/), so this is client/src/**.
    include: ['src/**/*.test.{ts,tsx}'],
    setupFiles: [fileURLToPath(new URL('./client/src/test/setup.ts', import.meta.url))],
    unstubGlobals: true,
    restoreMocks: true,
    // Screen tests type and click like a person; on a 2-core machine under load 5 s is too tight.
    testTimeout: 20_000,
    // Through Vite, so that its `dexie` import gets the alias above: one Dexie, as in the build.
    server: { deps: { inline: ['dexie-react-hooks'] } },
  },
}));
