"use client";
import { useEffect, useRef, useState } from "react";
import "swagger-ui-dist/swagger-ui.css";

/**
 * The API reference: Swagger UI (the `swagger-ui-dist` package's
 * self-contained bundle, served with the app: no CDN) rendering
 * /api/v1/openapi.json with the visitor's session. The bundle is loaded in
 * the browser only. Content-Security-Policy needs (docs/automation.md): no
 * inline script and no eval; `img-src 'self' data:` (its icons are data:
 * URIs in its stylesheet) and `connect-src 'self'` (it fetches the
 * description). It sets element styles through the DOM, which `style-src`
 * without 'unsafe-inline' allows.
 */
export function ApiReference() {
  const host = useRef<HTMLDivElement>(null);
  const [failed, setFailed] = useState<string | null>(null);
  const [ready, setReady] = useState(false);
  useEffect(() => {
    let cancelled = false;
    import("swagger-ui-dist/swagger-ui-es-bundle.js")
      .then(({ default: SwaggerUI }) => {
        if (cancelled || !host.current) return;
        SwaggerUI({
          domNode: host.current,
          url: "/api/v1/openapi.json",
          docExpansion: "list",
          defaultModelsExpandDepth: 0,
          tryItOutEnabled: false,
          validatorUrl: null,
          onComplete: () => setReady(true),
        });
      })
      .catch((e: unknown) => setFailed(e instanceof Error ? e.message : String(e)));
    return () => {
      cancelled = true;
    };
  }, []);
  return (
    <div className="rounded-md border border-ink/15 bg-white">
      {failed ? <p className="p-4 text-sm text-sev-error">The API reference could not be loaded: {failed}</p> : null}
      {!ready && !failed ? <p className="p-4 text-sm text-ink-soft">Loading the API reference…</p> : null}
      {/* Swagger UI owns this element's children; React leaves it empty. */}
      <div ref={host} data-testid="api-reference" />
    </div>
  );
}
