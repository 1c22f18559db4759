// After `expo export`: a service worker that precaches the exported web build, so the app
// shell opens without a connection. The API is never cached (drafts live in IndexedDB).
const { generateSW } = require('workbox-build');

generateSW({
  globDirectory: 'dist',
  globPatterns: ['index.html', 'favicon.ico', '_expo/static/**/*.{js,css}', 'assets/**/*.{ttf,otf,woff,woff2,png}'],
  // The default ignores **/node_modules/**, which is where Expo puts the font files.
  globIgnores: [],
  swDest: 'dist/sw.js',
  dontCacheBustURLsMatching: /[.-][0-9a-f]{32}(@\dx)?\.\w+$/,
  // The default 2 MiB would silently leave out the main bundle.
  maximumFileSizeToCacheInBytes: 8 * 1024 * 1024,
  navigateFallback: '/index.html',
  navigateFallbackDenylist: [/^\/api(\/|$)/],
  runtimeCaching: [],
  inlineWorkboxRuntime: true,
  cleanupOutdatedCaches: true,
  clientsClaim: true,
  skipWaiting: true,
  mode: 'production',
})
  .then(({ count, size }) => console.log(`service worker: ${count} files, ${Math.round(size / 1024)} KB precached`))
  .catch((error) => {
    console.error(error);
    process.exit(1);
  });
