import helmet from "helmet";

/**
 * The Content-Security-Policy the built app (dist/web) satisfies: scripts, styles, fonts and
 * workers only from this origin, no inline script, no plugins, never inside a frame.
 * `blob:` for workers and images: a worker or a downloaded picture may be built in the page.
 */
export const CONTENT_SECURITY_POLICY = {
  "default-src": ["'self'"],
  "script-src": ["'self'"],
  "script-src-attr": ["'none'"],
  "style-src": ["'self'"],
  "font-src": ["'self'"],
  "img-src": ["'self'", "data:", "blob:"],
  "connect-src": ["'self'"],
  "worker-src": ["'self'", "blob:"],
  "object-src": ["'none'"],
  "base-uri": ["'self'"],
  "form-action": ["'self'"],
  "frame-ancestors": ["'none'"],
} as const;

/** One year, the usual HSTS lifetime (common practice, no source). */
const HSTS_MAX_AGE_SECONDS = 365 * 24 * 60 * 60;

/**
 * Security headers on every response (pages, assets, API answers and errors alike).
 * `Referrer-Policy: no-referrer` because reset, invitation and join tokens travel in page
 * URLs. HSTS (and upgrading http subresources) only in production: a development or test
 * server on plain http must stay reachable over http.
 */
export function securityHeaders(options: { production: boolean }) {
  return helmet({
    contentSecurityPolicy: {
      useDefaults: false,
      directives: {
        ...CONTENT_SECURITY_POLICY,
        ...(options.production ? { "upgrade-insecure-requests": [] } : {}),
      },
    },
    strictTransportSecurity: options.production
      ? { maxAge: HSTS_MAX_AGE_SECONDS, includeSubDomains: true }
      : false,
    referrerPolicy: { policy: "no-referrer" },
    xFrameOptions: { action: "deny" },
  });
}
