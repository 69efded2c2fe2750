import { defineConfig, type Plugin } from 'vite';
import { svelte } from '@sveltejs/vite-plugin-svelte';
import { CONTENT_SECURITY_POLICY_META } from './main/server/security-policy.js';

/**
 * Put the Content Security Policy into the built page as a <meta> tag, so that it also holds where
 * no server sends headers (the desktop window loads the file from disk). Only on build: the dev
 * server injects styles inline for hot reload, which this policy forbids.
 */
function contentSecurityPolicyMeta(): Plugin {
  return {
    name: 'lamina-content-security-policy',
    apply: 'build',
    transformIndexHtml: () => [
      {
        tag: 'meta',
        attrs: { 'http-equiv': 'Content-Security-Policy', content: CONTENT_SECURITY_POLICY_META },
        injectTo: 'head-prepend',
      },
    ],
  };
}

export default defineConfig({
  root: 'renderer',
  // Relative asset paths, so Electron can load the built files from disk.
  base: './',
  plugins: [svelte({ configFile: false, compilerOptions: { runes: true } }), contentSecurityPolicyMeta()],
  build: {
    outDir: '../build/renderer',
    emptyOutDir: true,
    // Chromium in Electron and in the browser supports module preload; an inline polyfill would need 'unsafe-inline'.
    modulePreload: { polyfill: false },
  },
  server: { host: '127.0.0.1', port: 5179, strictPort: false },
});
