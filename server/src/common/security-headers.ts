import helmet from 'helmet';

/**
 * helmet's default headers (nosniff, frame-ancestors, referrer policy, cross-origin isolation of
 * resources) with its default Content-Security-Policy, changed in two places: no
 * `upgrade-insecure-requests` (the app is served over plain HTTP on localhost, and a TLS proxy in front
 * sets its own), and `blob:` images for previews of files picked in the browser.
 */
export function securityHeaders() {
  return helmet({
    contentSecurityPolicy: {
      useDefaults: true,
      directives: {
        'upgrade-insecure-requests': null,
        'img-src': ["'self'", 'data:', 'blob:'],
      },
    },
    // HSTS only means something over HTTPS, which a proxy in front of this server terminates.
    strictTransportSecurity: false,
  });
}
