import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';

// Client build. In development `/api` is proxied to the Express server on port 3000;
// in production the server serves dist/ itself, so the client always talks to its own origin.
export default defineConfig({
  plugins: [react(), tailwindcss()],
  server: {
    port: 5173,
    proxy: {
      '/api': { target: 'http://127.0.0.1:3000', changeOrigin: false },
    },
  },
  build: {
    outDir: 'dist',
    emptyOutDir: true,
    sourcemap: false,
    // The 3D viewer (three + react-three-fiber + drei, only under src/viewer) is imported solely by the lab's
    // pages, which the router loads lazily; the bundler therefore puts it in its own on-demand chunk.
    chunkSizeWarningLimit: 1200,
  },
});
