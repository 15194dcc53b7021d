import type { PlanInput } from "@/schemas/plan";

/** The four invented receiver chains of the demo sounder (demo data). */
const CHAINS = [
  { id: "oxy", f0: 118.75, sideband: "upper" as const },
  { id: "wv183", f0: 183.31, sideband: "upper" as const },
  { id: "win243", f0: 243.2, sideband: "lower" as const },
  { id: "wv325", f0: 325.15, sideband: "upper" as const },
];

/**
 * An invented plan with `channels` channels (1..256) spread over four
 * receiver chains beside the 118.75, 183.31 and 325.15 GHz lines and the
 * 243 GHz window, used by the lane view's lab page and benchmark. DEMO DATA:
 * every hardware number is made up.
 */
export function demoPlan(channels: number): PlanInput {
  const n = Math.max(1, Math.min(256, Math.floor(channels)));
  const per = CHAINS.map((_, i) => Math.floor(n / CHAINS.length) + (i < n % CHAINS.length ? 1 : 0));
  const plan: PlanInput = {
    format: "heterolane.plan/1",
    name: `Demo data: invented ${n}-channel sounder`,
    settings: { guardMHz: 20, imageRejectionDB: 25, spurMaxOrder: 3, replicaLimitDB: -20 },
    lasers: [],
    resonators: [],
    detectors: [],
    chains: [],
    channels: [],
  };
  CHAINS.forEach((c, i) => {
    const s = c.sideband === "upper" ? 1 : -1;
    const m = per[i] ?? 0;
    const spacing = 0.22;
    const lo = c.f0 - 2.5;
    plan.lasers.push({
      id: `pair-${c.id}`,
      carrierTHz: 193.4,
      carrierPowerMW: 4,
      loPowerMW: 3,
      reach: [{ minGHz: s > 0 ? c.f0 - 8 : -(c.f0 + 8), maxGHz: s > 0 ? c.f0 + 8 : -(c.f0 - 8) }],
      stepMHz: 10,
      driftMHz: 5,
      lock: { modulationMHz: 8000, modulationIndex: 0.5, orders: 1 },
    });
    plan.resonators.push({ id: `res-${c.id}`, fsrGHz: c.f0, loadedQ: 5e4 });
    plan.detectors.push({ id: `bpd-${c.id}`, minGHz: 0.1, maxGHz: 6, maxInputMW: 6, sampleRateGHz: null });
    plan.chains.push({
      id: c.id,
      laser: `pair-${c.id}`,
      resonator: `res-${c.id}`,
      detector: `bpd-${c.id}`,
      mode: 1,
      sideband: c.sideband,
      loOffsetGHz: Math.round(s * lo * 100) / 100,
      rfInput: { minGHz: c.f0 - 2.2, maxGHz: c.f0 + 2.2 },
      tapFraction: 0.01,
      pathLossDB: 3,
      carrierRejectionDB: 0,
      sharedIf: false,
    });
    for (let j = 0; j < m; j++) {
      const centre = Math.round((c.f0 + (j - (m - 1) / 2) * spacing) * 1000) / 1000;
      plan.channels.push({
        id: `${c.id}-${j + 1}`,
        name: `${c.f0} GHz chain, channel ${j + 1}`,
        chain: c.id,
        centerGHz: centre,
        bandwidthMHz: 150,
        dsbOffsetGHz: null,
        integrationMs: 10,
        antennaK: 250,
        receiverK: 3000,
        gainStability: 0,
        requiredNedtK: 5,
      });
    }
  });
  return plan;
}
