import { fileURLToPath } from 'node:url';
import tailwindcss from '@tailwindcss/vite';
import react from '@vitejs/plugin-react';
import { defineConfig } from 'vite';

// A stand-alone `vite` dev server forwards API calls to the Express server, so the
// browser sees one origin and the session cookie and CSRF token work as in production.
const apiServer = `http://127.0.0.1:${process.env.PORT ?? 5180}`;

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
    // The vendor chunk is one file on purpose (about 460 kB, 140 kB gzip, fetched once and cached).
    // The limit applies to the uncompressed size.
    chunkSizeWarningLimit: 800,
    rolldownOptions: {
      // Libraries change far less often than our code: a separate chunk stays cached on the
      // tablets across our releases, which matters on arena Wi-Fi. Routes are not split, so
      // moving between areas never waits on the network.
      output: { codeSplitting: { groups: [{ name: 'vendor', test: /node_modules/ }] } },
    },
  },
});
