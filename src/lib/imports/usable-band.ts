export interface ResponsePoint {
  frequencyGHz: number;
  responseDB: number;
}

export interface UsableBand {
  minGHz: number;
  maxGHz: number;
  peakDB: number;
  peakGHz: number;
}

/**
 * The usable band of a measured detector response: the contiguous run of
 * samples around the peak whose response is within `dropDB` of the peak
 * (the "3 dB bandwidth" convention for dropDB = 3, common practice). The
 * band edges are the outermost samples inside the run (no interpolation
 * beyond them, so the band never claims frequencies where the response was
 * not seen within the limit). The first sample of the highest response is
 * the peak. Null when fewer than two samples qualify (zero width).
 * Allows 1e-9 dB for rounding, in favour of inclusion.
 */
export function usableBand(points: readonly ResponsePoint[], dropDB: number): UsableBand | null {
  const s = [...points].sort((a, b) => a.frequencyGHz - b.frequencyGHz);
  if (s.length === 0) return null;
  let peak = 0;
  for (let i = 1; i < s.length; i++)
    if ((s[i] as ResponsePoint).responseDB > (s[peak] as ResponsePoint).responseDB) peak = i;
  const peakDB = (s[peak] as ResponsePoint).responseDB;
  const floor = peakDB - dropDB - 1e-9;
  let lo = peak;
  while (lo > 0 && (s[lo - 1] as ResponsePoint).responseDB >= floor) lo--;
  let hi = peak;
  while (hi < s.length - 1 && (s[hi + 1] as ResponsePoint).responseDB >= floor) hi++;
  const minGHz = (s[lo] as ResponsePoint).frequencyGHz;
  const maxGHz = (s[hi] as ResponsePoint).frequencyGHz;
  if (!(maxGHz > minGHz)) return null;
  return { minGHz, maxGHz, peakDB, peakGHz: (s[peak] as ResponsePoint).frequencyGHz };
}
