import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { usableBand, type ResponsePoint } from "./usable-band";

/** Simpler independent reading: the largest window of consecutive samples holding the peak with every sample ≥ peak − drop. */
function naiveBand(points: ResponsePoint[], drop: number): [number, number] | null {
  const s = [...points].sort((a, b) => a.frequencyGHz - b.frequencyGHz);
  const peakDB = Math.max(...s.map((p) => p.responseDB));
  const peakIdx = s.findIndex((p) => p.responseDB === peakDB);
  let best: [number, number] | null = null;
  for (let i = 0; i <= peakIdx; i++)
    for (let j = peakIdx; j < s.length; j++) {
      const ok = s.slice(i, j + 1).every((p) => p.responseDB >= peakDB - drop - 1e-9);
      if (ok && (!best || j - i > best[1] - best[0])) best = [i, j];
    }
  if (!best || best[0] === best[1]) return null;
  return [(s[best[0]] as ResponsePoint).frequencyGHz, (s[best[1]] as ResponsePoint).frequencyGHz];
}

const distinctFreqs = fc.uniqueArray(fc.integer({ min: 0, max: 2000 }), { minLength: 1, maxLength: 40 });

describe("usableBand", () => {
  it("finds the half-power band of a single-pole roll-off sampled every 0.5 GHz", () => {
    // |H|² = 1/(1+(f/fc)²) with fc = 4 GHz falls 3.0103 dB at f = fc (a single-pole low-pass, textbook:
    // Sedra & Smith, Microelectronic Circuits, STC networks). Sampled on 0.5 GHz steps the last sample
    // within 3.0103 dB is 4.0 GHz (−3.0103 dB) and the first sample is 0.5 GHz.
    const pts = Array.from({ length: 20 }, (_, i) => {
      const f = 0.5 * (i + 1);
      return { frequencyGHz: f, responseDB: -10 * Math.log10(1 + (f / 4) ** 2) };
    });
    const band = usableBand(pts, 10 * Math.log10(2) - -10 * Math.log10(1 + (0.5 / 4) ** 2));
    expect(band?.minGHz).toBe(0.5);
    expect(band?.maxGHz).toBe(4);
    expect(band?.peakGHz).toBe(0.5);
  });

  it("stops at the first dip below the limit even when the response recovers later (contiguous around the peak)", () => {
    const pts = [1, 2, 3, 4, 5, 6].map((f, i) => ({
      frequencyGHz: f,
      responseDB: [-2, 0, -1, -5, -0.5, -1][i] as number,
    }));
    expect(usableBand(pts, 3)).toEqual({ minGHz: 1, maxGHz: 3, peakDB: 0, peakGHz: 2 });
  });

  it("returns null when only the peak is within the drop", () => {
    expect(
      usableBand(
        [
          { frequencyGHz: 1, responseDB: 0 },
          { frequencyGHz: 2, responseDB: -10 },
        ],
        3,
      ),
    ).toBeNull();
  });

  it("contains the peak, keeps every sample inside within the drop, and agrees with a brute-force window search", () => {
    fc.assert(
      fc.property(
        distinctFreqs,
        fc.array(fc.double({ min: -40, max: 10, noNaN: true }), { minLength: 40, maxLength: 40 }),
        fc.double({ min: 0.1, max: 20, noNaN: true }),
        (freqs, resp, drop) => {
          const pts = freqs.map((f, i) => ({ frequencyGHz: f / 100, responseDB: resp[i] as number }));
          const band = usableBand(pts, drop);
          const naive = naiveBand(pts, drop);
          if (!band) {
            expect(naive).toBeNull();
            return;
          }
          expect([band.minGHz, band.maxGHz]).toEqual(naive);
          expect(band.peakGHz).toBeGreaterThanOrEqual(band.minGHz);
          expect(band.peakGHz).toBeLessThanOrEqual(band.maxGHz);
          for (const p of pts)
            if (p.frequencyGHz >= band.minGHz && p.frequencyGHz <= band.maxGHz)
              expect(p.responseDB).toBeGreaterThanOrEqual(band.peakDB - drop - 1e-9);
        },
      ),
      { numRuns: 300 },
    );
  });
});
