import { readdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { brotliCompressSync, constants, gzipSync } from 'node:zlib';
import tailwindcss from '@tailwindcss/vite';
import react from '@vitejs/plugin-react';
import { defineConfig, type Plugin } from 'vite';
import { reportBudget } from './budget';

const src = decodeURIComponent(new URL('./src', import.meta.url).pathname);

/**
 * Writes a .br and a .gz beside every text asset of the build (over 1 kB), so the server sends
 * them as they are (express-static-gzip) instead of compressing on every request.
 */
function precompress(): Plugin {
  let outDir = 'dist';
  return {
    name: 'driftmark-precompress',
    apply: 'build',
    configResolved(config) {
      outDir = path.resolve(config.root, config.build.outDir);
    },
    closeBundle() {
      const walk = (dir: string): string[] =>
        readdirSync(dir).flatMap((name) => {
          const file = path.join(dir, name);
          return statSync(file).isDirectory() ? walk(file) : [file];
        });
      for (const file of walk(outDir)) {
        if (!/\.(js|css|html|svg|json|txt)$/.test(file) || file.includes(`${path.sep}.vite${path.sep}`))
          continue;
        const body = readFileSync(file);
        if (body.length < 1024) continue;
        writeFileSync(`${file}.gz`, gzipSync(body, { level: 9 }));
        writeFileSync(
          `${file}.br`,
          brotliCompressSync(body, { params: { [constants.BROTLI_PARAM_QUALITY]: 11 } }),
        );
      }
    },
  };
}

/** The first-route JavaScript budget (budget.ts), checked on every build after the files are written. */
function firstRouteBudget(): Plugin {
  let outDir = 'dist';
  return {
    name: 'driftmark-first-route-budget',
    apply: 'build',
    configResolved(config) {
      outDir = path.resolve(config.root, config.build.outDir);
    },
    closeBundle() {
      if (!reportBudget(outDir)) throw new Error('The first-route JavaScript is over its budget.');
    },
  };
}

export default defineConfig({
  plugins: [react(), tailwindcss(), precompress(), firstRouteBudget()],
  resolve: {
    alias: { '@': src },
  },
  server: {
    host: '127.0.0.1',
    port: 5173,
    strictPort: true,
    proxy: {
      // changeOrigin stays false: the API's CSRF check compares Origin with EXTRA_ORIGINS,
      // which lists the Vite origin in development.
      '/api': { target: 'http://127.0.0.1:3000', changeOrigin: false },
    },
  },
  preview: {
    host: '127.0.0.1',
    port: 4173,
  },
  build: {
    outDir: 'dist',
    emptyOutDir: true,
    sourcemap: true,
    // dist/.vite/manifest.json: which chunks each route loads (read by the budget check and the bench).
    manifest: true,
    rolldownOptions: {
      output: {
        // Libraries change less often than the app: separate chunks stay cached across releases. No
        // catch-all vendor chunk: the charting and table libraries load only with the screens that
        // draw a chart or a table (each route is its own chunk, see app/router.tsx).
        codeSplitting: {
          groups: [
            { name: 'react', test: /node_modules[\\/](react|react-dom|scheduler|react-router)[\\/]/ },
            {
              name: 'charts',
              test: /node_modules[\\/](recharts|d3-[a-z-]+|victory-vendor|internmap|decimal\.js-light|es-toolkit|redux|@reduxjs|immer|reselect|react-redux|use-sync-external-store)[\\/]/,
            },
            { name: 'table', test: /node_modules[\\/]@tanstack[\\/](react-table|table-core)[\\/]/ },
            { name: 'data', test: /node_modules[\\/]@tanstack[\\/](react-query|query-core)[\\/]/ },
            // zod loads with the forms and the screens that parse; the entry and the session need none.
            { name: 'zod', test: /node_modules[\\/]zod[\\/]/ },
          ],
        },
      },
    },
  },
});
