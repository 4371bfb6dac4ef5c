// Browser build of the editor: `npx vite build --config renderer/vite.config.ts` → dist/web.
// base './' so the same files load from a custom protocol in Electron and from any web path.
import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';

const here = (relative: string): string => decodeURIComponent(new URL(relative, import.meta.url).pathname);

export default defineConfig({
  root: here('.'),
  base: './',
  plugins: [react()],
  build: { outDir: here('../dist/web'), emptyOutDir: true, sourcemap: true },
  server: { port: 5178, strictPort: false },
});
