"use client";
import dynamic from "next/dynamic";
import "swagger-ui-react/swagger-ui.css";

// Swagger UI runs in the browser only; it is bundled with the app (no CDN) and
// reads the description from this server, with the visitor's session.
const SwaggerUI = dynamic(() => import("swagger-ui-react"), {
  ssr: false,
  loading: () => <p className="text-sm text-ink-soft">Loading the API reference…</p>,
});

/**
 * The API reference: swagger-ui-react rendering /api/v1/openapi.json.
 * Content-Security-Policy needs (docs/automation.md): no inline script and no
 * eval; `img-src 'self' data:` (its icons are data: URIs in its stylesheet);
 * `connect-src 'self'` (it fetches the description and, with "Try it out",
 * calls the API). It sets element styles through the DOM (allowed without
 * 'unsafe-inline').
 */
export function ApiReference() {
  return (
    <div data-testid="api-reference" className="rounded-md border border-ink/15 bg-white">
      <SwaggerUI url="/api/v1/openapi.json" docExpansion="list" defaultModelsExpandDepth={0} tryItOutEnabled={false} />
    </div>
  );
}
