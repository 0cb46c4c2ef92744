/**
 * The Content-Security-Policy of the built app: scripts, workers, styles, data and fonts only
 * from the app's own origin; no inline script and no eval; no plugins, no base or form
 * targets. Styles: 'unsafe-inline' is NOT granted; Plotly sets its styles through the CSSOM
 * (element.style and insertRule), which a policy does not restrict. Images: data: and blob:
 * for the plot exports (Plotly's toImage, the PDF's plot image). Connections: the app's own
 * origin only (the service worker's precache and nothing else). Set as a <meta> tag in the
 * built index.html and as a header by `vite preview` (which can also forbid framing).
 */
const DIRECTIVES: Record<string, string> = {
  'default-src': "'self'",
  'script-src': "'self'",
  'style-src': "'self'",
  'img-src': "'self' data: blob:",
  'font-src': "'self'",
  'connect-src': "'self'",
  'worker-src': "'self'",
  'manifest-src': "'self'",
  'object-src': "'none'",
  'base-uri': "'self'",
  'form-action': "'none'",
};

export const CONTENT_SECURITY_POLICY = Object.entries(DIRECTIVES)
  .map(([name, value]) => `${name} ${value}`)
  .join('; ');

/** As an HTTP header, which may also forbid other sites from framing the app. */
export const CONTENT_SECURITY_POLICY_HEADER = `${CONTENT_SECURITY_POLICY}; frame-ancestors 'none'`;
