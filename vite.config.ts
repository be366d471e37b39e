// Vite (client build, dev server) and Vitest (all test layers) configuration.
import { fileURLToPath, URL } from 'node:url'
import { defineConfig } from 'vitest/config'
import vue from '@vitejs/plugin-vue'
import vuetify from 'vite-plugin-vuetify'
import { VitePWA } from 'vite-plugin-pwa'
import { databaseUrl, TEST_API_DATABASE } from './scripts/lib/paths.mjs'

const API_PORT = Number(process.env.API_PORT ?? process.env.PORT ?? 3000)
const alias = { '@': fileURLToPath(new URL('./src', import.meta.url)) }

export default defineConfig({
  plugins: [
    vue(),
    vuetify({ autoImport: true }),
    // Installable and usable offline (production builds; no service worker in `npm run dev`): the
    // worker is src/service-worker/sw.ts, its precache every built file, font and sampled sound.
    VitePWA({
      strategies: 'injectManifest',
      srcDir: 'src/service-worker',
      filename: 'sw.ts',
      injectRegister: 'script-defer',
      devOptions: { enabled: false },
      injectManifest: {
        globPatterns: ['**/*.{js,css,html,svg,png,woff2,mp3}'],
        globIgnores: ['**/LICENSE*'],
      },
      manifest: {
        name: 'Ambitus — fretboard practice',
        short_name: 'Ambitus',
        description: 'Fretboard fluency drills for bass and guitar students and their teachers.',
        start_url: '/practice',
        scope: '/',
        display: 'standalone',
        background_color: '#F4EBDD',
        theme_color: '#1E4D6B',
        icons: [
          { src: '/icons/icon-192.png', sizes: '192x192', type: 'image/png' },
          { src: '/icons/icon-512.png', sizes: '512x512', type: 'image/png' },
          {
            src: '/icons/maskable-512.png',
            sizes: '512x512',
            type: 'image/png',
            purpose: 'maskable',
          },
        ],
      },
    }),
  ],
  resolve: { alias },
  server: {
    host: '127.0.0.1',
    proxy: { '/api': `http://127.0.0.1:${API_PORT}` },
  },
  build: {
    chunkSizeWarningLimit: 900,
    // Imported constants are copied to where they are used: an @mdi/js icon goes with the page that
    // shows it, not into one chunk of every icon of the app that the first page must load.
    rolldownOptions: { optimization: { inlineConst: true } },
  },
  test: {
    // Most test time is waiting on PostgreSQL and Chromium, so more workers than cores pays off.
    maxWorkers: 3,
    projects: [
      {
        extends: true,
        test: {
          name: 'unit',
          environment: 'node',
          // Pure modules: one module graph for all files saves re-importing tonal per file.
          isolate: false,
          include: ['src/**/*.test.ts', 'tests/unit/**/*.test.ts'],
          // Property-based theory checks run hundreds of cases; a busy machine must not fail them.
          testTimeout: 30_000,
        },
      },
      {
        extends: true,
        test: {
          name: 'client',
          environment: 'jsdom',
          include: ['tests/client/**/*.test.ts'],
          setupFiles: ['tests/helpers/client-setup.ts'],
          server: { deps: { inline: ['vuetify'] } },
          // A first mount of a drill view transforms Vuetify and the theory core on demand; on two
          // cores shared with the server and browser tests that has taken over 5 s.
          testTimeout: 20_000,
        },
      },
      {
        extends: true,
        test: {
          name: 'server',
          environment: 'node',
          include: ['tests/server/**/*.test.ts'],
          globalSetup: ['tests/helpers/server-global-setup.ts'],
          env: { DATABASE_URL: databaseUrl(TEST_API_DATABASE), LOG_LEVEL: 'silent' },
          execArgv: ['--import', 'tsx'],
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
      {
        extends: true,
        test: {
          name: 'e2e',
          environment: 'node',
          include: ['tests/e2e/**/*.spec.ts'],
          globalSetup: ['tests/helpers/e2e-global-setup.ts'],
          // Spec files run side by side; each works with its own demo people (see DEVELOPERS.md).
          // The longest walks (a played take, a shared exercise) need minutes on a loaded machine.
          testTimeout: 180_000,
          hookTimeout: 180_000,
          // The browser waits on a server that shares two cores with other spec files.
          expect: { poll: { timeout: 15_000, interval: 100 } },
        },
      },
    ],
  },
})
