/**
 * The Content Security Policy and companion headers for every page Lamina shows, in the desktop
 * window and in browser mode alike. One definition so that the two cannot drift apart.
 *
 * Everything comes from Lamina's own origin; no inline script or style, no remote content, no
 * plug-ins, no framing, no form posts; workers only from the app's own files. Svelte's build emits
 * its CSS as a file, so 'self' suffices.
 */
export const CONTENT_SECURITY_POLICY = [
  "default-src 'self'",
  "script-src 'self'",
  "style-src 'self'",
  "img-src 'self' data:",
  "font-src 'self'",
  "connect-src 'self'",
  // The case editor solves in a module Web Worker loaded from the app's own files.
  "worker-src 'self'",
  "object-src 'none'",
  "base-uri 'none'",
  "form-action 'none'",
  "frame-ancestors 'none'",
].join('; ');

/**
 * The same policy for a <meta> tag in the built page, where browsers ignore frame-ancestors (the
 * server's header and Electron's own window carry that part).
 */
export const CONTENT_SECURITY_POLICY_META = CONTENT_SECURITY_POLICY.split('; ')
  .filter((directive) => !directive.startsWith('frame-ancestors'))
  .join('; ');

/** Headers sent with every browser-mode response. */
export const SECURITY_HEADERS: Readonly<Record<string, string>> = {
  'Content-Security-Policy': CONTENT_SECURITY_POLICY,
  'X-Content-Type-Options': 'nosniff',
  'Referrer-Policy': 'no-referrer',
  'Cross-Origin-Opener-Policy': 'same-origin',
  'Cross-Origin-Resource-Policy': 'same-origin',
  'X-Frame-Options': 'DENY',
  // Local files change with every build; never let the browser show a stale engine.
  'Cache-Control': 'no-store',
};
