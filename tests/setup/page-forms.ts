/**
 * Submitting a page's form as a browser without JavaScript does: a
 * multipart POST carrying React's hidden action fields (read from the
 * page), plus the form's own fields.
 */
import type { TestClient } from "./auth-helpers";

/** The hidden action fields of the first form on the page's HTML. */
export function actionFields(html: string): [string, string][] {
  return [...html.matchAll(/<input type="hidden" name="(\$ACTION[^"]*)"(?: value="([^"]*)")?\/>/g)].map((m) => [
    m[1]!,
    (m[2] ?? "").replace(/&quot;/g, '"').replace(/&amp;/g, "&"),
  ]);
}

/** GETs `path` as `c`, then posts its form with `fields`; returns status, HTML and redirect target. */
export async function submitPageForm(
  c: TestClient,
  path: string,
  fields: Record<string, string>,
): Promise<{ status: number; html: string; location: string | null }> {
  const html = await (await c.fetch(path)).text();
  const form = new FormData();
  for (const [k, v] of actionFields(html)) form.append(k, v);
  for (const [k, v] of Object.entries(fields)) form.append(k, v);
  const res = await c.fetch(path, { method: "POST", body: form });
  return { status: res.status, html: await res.text(), location: res.headers.get("location") };
}
