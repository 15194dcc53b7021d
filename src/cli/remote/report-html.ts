/**
 * The printable report of a revision as one self-contained HTML page (no
 * scripts, no external files): what `heterolane report` writes. It shows
 * the revision's own plan document and stored result, so it is exactly what
 * was saved. The app's report page offers printing to PDF from the browser;
 * the server has no PDF export, so the command line writes HTML.
 */

interface Finding {
  severity: string;
  code: string;
  chain: string | null;
  channel: string | null;
  message: string;
}
interface Row {
  id: string;
  [field: string]: unknown;
}

export interface ReportData {
  mission: { id: string; name: string; description: string; status: string };
  revision: {
    number: number;
    status: string;
    authorName: string;
    createdAt: string;
    summary: string;
    plan: {
      name: string;
      settings: Record<string, unknown>;
      lasers: Row[];
      resonators: Row[];
      detectors: Row[];
      chains: Row[];
      channels: Row[];
    };
    result: { chains?: Row[]; channels?: Row[]; findings?: Finding[] };
  };
  printedAt: Date;
}

const esc = (v: unknown) =>
  String(v ?? "–").replace(
    /[&<>"']/g,
    (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!,
  );

/** A value for a table cell: numbers as written, intervals as [a, b], objects as compact JSON. */
function cell(v: unknown): string {
  if (v === null || v === undefined) return "–";
  if (Array.isArray(v) && v.every((x) => typeof x === "number")) return `[${v.join(", ")}]`;
  if (typeof v === "object") return JSON.stringify(v);
  return String(v);
}

function rowsTable(title: string, rows: Row[], extra?: Map<string, Row>): string {
  if (!rows.length) return `<h2>${esc(title)}</h2><p>None.</p>`;
  const keys = [...new Set(rows.flatMap((r) => Object.keys(r)))];
  const extraKeys = extra
    ? [...new Set([...extra.values()].flatMap((r) => Object.keys(r)))].filter((k) => k !== "id")
    : [];
  const head = [...keys, ...extraKeys.map((k) => `result: ${k}`)];
  const body = rows
    .map((r) => {
      const x = extra?.get(r.id);
      const cells = [...keys.map((k) => cell(r[k])), ...extraKeys.map((k) => cell(x?.[k]))];
      return `<tr>${cells.map((c) => `<td>${esc(c)}</td>`).join("")}</tr>`;
    })
    .join("\n");
  return `<h2>${esc(title)}</h2><table><thead><tr>${head.map((h) => `<th>${esc(h)}</th>`).join("")}</tr></thead><tbody>\n${body}\n</tbody></table>`;
}

export function reportHtml({ mission, revision, printedAt }: ReportData): string {
  const plan = revision.plan;
  const findings = revision.result.findings ?? [];
  const count = (s: string) => findings.filter((f) => f.severity === s).length;
  const byId = (rows: Row[] | undefined) => new Map((rows ?? []).map((r) => [r.id, r]));
  const stamp = (d: Date | string) => new Date(d).toISOString().slice(0, 16).replace("T", " ") + " UTC";
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<title>${esc(mission.name)} · revision ${revision.number} · Heterolane report</title>
<style>
  @page { size: A4 landscape; margin: 12mm; }
  body { font: 12px/1.35 system-ui, sans-serif; color: #111; margin: 1.5rem; }
  h1 { font-size: 1.6rem; margin: 0.2rem 0; } h2 { font-size: 1rem; margin: 1.2rem 0 0.4rem; }
  table { border-collapse: collapse; width: 100%; } th, td { border: 1px solid #bbb; padding: 2px 4px; text-align: left; vertical-align: top; }
  th { background: #f1f1f1; } tr { page-break-inside: avoid; } thead { display: table-header-group; }
  .caution { border: 1px solid #c80; padding: 0.5rem; margin-top: 0.8rem; }
  .sev-error { color: #b00; } .sev-warning { color: #a60; }
</style>
</head>
<body>
<p>Heterolane · frequency plan report</p>
<h1>${esc(mission.name)}</h1>
${mission.description ? `<p>${esc(mission.description)}</p>` : ""}
<p>Status ${esc(revision.status)} · revision ${revision.number} by ${esc(revision.authorName)} · ${esc(stamp(revision.createdAt))} · printed ${esc(stamp(printedAt))} · ${count("error")} errors, ${count("warning")} warnings, ${count("info")} info</p>
<p>${esc(revision.summary)}</p>
<div class="caution">
<p><strong>Laser safety.</strong> The optical powers below are planning values. Follow the laser safety rules of your site (IEC 60825-1 and your laser safety officer) whenever these sources are operated.</p>
<p><strong>Sensitivity.</strong> NEΔT and radiometric bandwidth are design estimates, not calibration.</p>
</div>
<h2>Check settings</h2>
<p>${Object.entries(plan.settings)
    .map(([k, v]) => `${esc(k)} ${esc(cell(v))}`)
    .join(" · ")}</p>
${rowsTable("Lasers", plan.lasers)}
${rowsTable("Resonators", plan.resonators)}
${rowsTable("Detectors", plan.detectors)}
${rowsTable("Receiver chains", plan.chains, byId(revision.result.chains))}
${rowsTable("Channels", plan.channels, byId(revision.result.channels))}
<h2>Findings (${findings.length})</h2>
${
  findings.length
    ? `<table><thead><tr><th>severity</th><th>code</th><th>chain</th><th>channel</th><th>message</th></tr></thead><tbody>\n${findings
        .map(
          (f) =>
            `<tr class="sev-${esc(f.severity)}"><td>${esc(f.severity)}</td><td>${esc(f.code)}</td><td>${esc(f.chain)}</td><td>${esc(f.channel)}</td><td>${esc(f.message)}</td></tr>`,
        )
        .join("\n")}\n</tbody></table>`
    : "<p>No findings.</p>"
}
</body>
</html>
`;
}
