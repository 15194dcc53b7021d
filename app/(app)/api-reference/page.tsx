import type { Metadata } from "next";
import Link from "next/link";
import { ApiReference } from "@/components/account/api-reference";
import { requirePageActor } from "@/server/auth/page-guard";

export const metadata: Metadata = { title: "API reference" };

export default async function ApiReferencePage() {
  await requirePageActor("/api-reference");
  return (
    <main className="mx-auto flex max-w-6xl flex-col gap-4 px-4 py-8">
      <header>
        <h1 className="text-2xl font-semibold tracking-tight">API reference</h1>
        <p className="text-sm text-ink-soft">
          The HTTP API under <code>/api/v1</code>, described by{" "}
          <a href="/api/v1/openapi.json" className="underline">
            /api/v1/openapi.json
          </a>{" "}
          (OpenAPI 3.1). Scripts authenticate with a personal API token from your{" "}
          <Link href="/account" className="underline">
            account page
          </Link>
          : <code>Authorization: Bearer hl_…</code>. Every operation is listed below with its request and its answer.
        </p>
      </header>
      <ApiReference />
    </main>
  );
}
