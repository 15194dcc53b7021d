import { demoPlan } from "@db/seed/mission-demo-plan";
import type { PlanInput } from "@/schemas/plan";

/**
 * A plan at the format's limits (docs/plan-format.md): 64 chains and 256
 * channels, made of sixteen renamed copies of the demo mission's four chains
 * (their lasers and resonators copied too, the two detectors shared), each
 * chain carrying its three demo channels and one more 0.2 GHz above its
 * core channel. Invented demo data, for the API benchmark (src/bench/api.ts):
 * the largest check a caller can ask for.
 */
export function limitsPlan(): PlanInput {
  const demo = demoPlan();
  const copies = Array.from({ length: 16 }, (_, k) => k + 1);
  const tag = (id: string, k: number) => `${id}-x${k}`;
  const channels = copies.flatMap((k) =>
    demo.chains.flatMap((chain) => {
      const own = demo.channels.filter((c) => c.chain === chain.id);
      const core = own[0]!;
      const extra = {
        ...core,
        id: `${core.id}-plus`,
        name: `${core.name} (+0.2 GHz)`,
        centerGHz: core.centerGHz + 0.2,
      };
      return [...own, extra].map((c) => ({
        ...c,
        id: tag(c.id, k),
        name: `${c.name} (copy ${k})`,
        chain: tag(chain.id, k),
      }));
    }),
  );
  return {
    ...demo,
    name: "Demo data: a plan at the format's limits (64 chains, 256 channels)",
    lasers: copies.flatMap((k) => demo.lasers.map((l) => ({ ...l, id: tag(l.id, k) }))),
    resonators: copies.flatMap((k) => demo.resonators.map((r) => ({ ...r, id: tag(r.id, k) }))),
    chains: copies.flatMap((k) =>
      demo.chains.map((c) => ({ ...c, id: tag(c.id, k), laser: tag(c.laser, k), resonator: tag(c.resonator, k) })),
    ),
    channels,
  };
}
