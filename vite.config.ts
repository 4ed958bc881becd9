import { fileURLToPath, URL } from 'node:url';
import { defineConfig } from 'vite';
import vue from '@vitejs/plugin-vue';
import Components from 'unplugin-vue-components/vite';
import { AntDesignVueResolver } from 'unplugin-vue-components/resolvers';
import { compression } from 'vite-plugin-compression2';

const apiPort = Number(process.env.PORT ?? 5180);

export default defineConfig({
  plugins: [
    vue(),
    // Each <a-…> tag imports only its own ant-design-vue component (v4 styles are CSS-in-JS: nothing else to import).
    // Not under vitest: component tests register ant-design-vue themselves (its CommonJS build, as Node resolves
    // it), and the resolver's ES-module imports would load a second copy of the library into every test.
    { ...Components({ resolvers: [AntDesignVueResolver({ importStyle: false, resolveIcons: false })], dts: false, dirs: [] }), apply: (_config, env) => env.mode !== 'test' },
    // Brotli and gzip copies beside each built asset, served as they are by the server (no compression per request).
    compression({ algorithms: ['brotliCompress', 'gzip'], threshold: 1024, logLevel: 'silent' }),
  ],
  resolve: {
    alias: {
      '@': fileURLToPath(new URL('./src', import.meta.url)),
      '@shared': fileURLToPath(new URL('./shared', import.meta.url)),
    },
  },
  server: {
    port: 5173,
    proxy: { '/api': `http://127.0.0.1:${apiPort}` },
  },
  build: {
    outDir: 'dist',
    chunkSizeWarningLimit: 2000,
  },
  worker: { format: 'es' },
});
