import type { ResultDocument } from "@/lib/plan";
import type { Plan } from "@/schemas/plan";
import { SEVERITY_COLOUR } from "../vocabulary";
import { fmt } from "./format";

/** Each channel's IF slot, NEΔT against its requirement and image rejection, from the live re-check. */
export function ChannelFigures({ plan, result }: { plan: Plan; result: ResultDocument }) {
  const byId = new Map(result.channels.map((c) => [c.id, c]));
  return (
    <details className="rounded border border-ink-faint p-3" open={plan.channels.length <= 16}>
      <summary className="cursor-pointer text-sm font-semibold">Channel figures (live)</summary>
      <table className="mt-2 w-full text-xs" data-testid="channel-figures">
        <thead>
          <tr className="text-left">
            {["Channel", "Chain", "IF slot (GHz)", "NEΔT (K)", "Required (K)", "Image rejection (dB)"].map((h) => (
              <th key={h} scope="col" className="px-2 font-semibold">
                {h}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {plan.channels.map((c) => {
            const r = byId.get(c.id);
            const unmet = r?.nedtK != null && c.requiredNedtK != null && r.nedtK > c.requiredNedtK;
            return (
              <tr key={c.id} data-channel={c.id}>
                <th scope="row" className="px-2 text-left font-normal">
                  {c.id}
                </th>
                <td className="px-2">{c.chain}</td>
                <td className="px-2 tabular-nums">
                  {r?.ifSlotGHz ? `${fmt(r.ifSlotGHz[0], 4)} – ${fmt(r.ifSlotGHz[1], 4)}` : "no slot"}
                </td>
                <td
                  className="px-2 tabular-nums"
                  style={unmet ? { color: SEVERITY_COLOUR.error } : undefined}
                  data-testid={`nedt-${c.id}`}
                >
                  {r?.nedtK != null ? fmt(r.nedtK, 3) : "—"}
                </td>
                <td className="px-2 tabular-nums">{c.requiredNedtK ?? "—"}</td>
                <td className="px-2 tabular-nums">{r?.imageRejectionDB != null ? fmt(r.imageRejectionDB, 2) : "—"}</td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </details>
  );
}
