import { fileURLToPath } from 'node:url';
import tailwindcss from '@tailwindcss/vite';
import react from '@vitejs/plugin-react';
import { defineConfig } from 'vite';

// A stand-alone `vite` dev server forwards API calls to the Express server, so the
// browser sees one origin and the session cookie and CSRF token work as in production.
const apiServer = `http://127.0.0.1:${process.env.PORT ?? 5180}`;

interface ModuleGraph {
  getModuleInfo(id: string): { isEntry: boolean; importers: readonly string[] } | null;
}

/**
 * Whether the app loads a module at start: it is the entry, or some module that is loaded at
 * start imports it statically. A library reached only through a lazy `import()` (recharts, for
 * the battery charts) is not, so it stays in the lazy chunk instead of the vendor chunk.
 */
function loadedAtStart(id: string, graph: ModuleGraph, seen = new Set<string>()): boolean {
  if (seen.has(id)) return false;
  seen.add(id);
  const info = graph.getModuleInfo(id);
  return !!info && (info.isEntry || info.importers.some((importer) => loadedAtStart(importer, graph, seen)));
}

export default defineConfig({
  plugins: [react(), tailwindcss()],
  resolve: {
    alias: { '@shared': fileURLToPath(new URL('./shared', import.meta.url)) },
  },
  server: {
    proxy: {
      '/api': { target: apiServer },
      '/socket.io': { target: apiServer, ws: true },
    },
  },
  build: {
    outDir: 'dist',
    emptyOutDir: true,
    // The vendor chunk is one file on purpose (about 550 kB, 170 kB gzip, fetched once and cached).
    // The limit applies to the uncompressed size.
    chunkSizeWarningLimit: 800,
    rolldownOptions: {
      // Libraries change far less often than our code: a separate chunk stays cached on the
      // tablets across our releases, which matters on arena Wi-Fi. Routes are not split, so
      // moving between areas never waits on the network; the one lazy part is the battery
      // charts, whose library is larger than the rest of the battery area.
      output: {
        codeSplitting: {
          groups: [{ debugName: 'vendor', name: (id, graph) => (loadedAtStart(id, graph) ? 'vendor' : null), test: /node_modules/ }],
        },
      },
    },
  },
});
