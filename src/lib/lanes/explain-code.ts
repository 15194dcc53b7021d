import type { FindingCode } from "@/lib/plan";

/**
 * A plain sentence for each rule code (docs/plan-format.md §4.1 "The rules"), for the
 * details panel and the tooltips of blocked LO intervals.
 */
const TEXT: Readonly<Record<FindingCode, string>> = {
  "lo-uncovered": "The LO with its drift is not inside one reach interval of the laser pair.",
  "lo-in-band": "The LO sits inside one of the channel's optical bands, so the channel has no IF slot.",
  "dsb-lo-off-centre":
    "The LO of a double-sideband channel is off the channel centre: the two passbands fold onto a wider IF band.",
  "lo-off-step": "The LO offset is not a multiple of the laser pair's tuning step.",
  "band-outside-rf-input": "A passband is not inside the chain's RF input passband.",
  "mode-detuned": "A passband centre lies more than half a linewidth from the wanted resonator mode.",
  "centre-drift":
    "Over the operating envelope, the effective centre of a passband strays further than its centre tolerance.",
  "band-wider-than-mode": "The passband is wider than the mode: the mode, not the channel filter, shapes the response.",
  "if-outside-detector": "The occupied IF band (slot ± drift) is not inside the detector's usable band.",
  "slot-overlap": "Two channels of the chain have occupied IF bands closer than the guard band.",
  "image-response": "The image response is rejected by less than the required image rejection.",
  "spur-in-slot": "A spur product comes within the guard band of an occupied IF band.",
  "nyquist-straddle": "The occupied IF band contains a multiple of half the sample rate.",
  "alias-overlap": "Occupied bands in different Nyquist zones fold onto each other within the guard band.",
  "noise-folding": "The detector band spans more than one Nyquist zone, so its noise folds onto every slot.",
  "lock-replica": "The lock sidebands copy too much of the neighbouring spectrum into the channel.",
  "lock-inside-mode":
    "The lock modulation frequency is below the linewidth: the lock sidebands sit inside the carrier's mode.",
  "carrier-dominates-lo": "The residual carrier at the detector is stronger than the LO and sets the shot-noise floor.",
  "pd-overload": "The optical power per photodiode exceeds the detector's limit.",
  "thermal-noise-limited":
    "The detector's own current noise is more than a third of the LO's shot noise: more LO power or a quieter amplifier would help.",
  "laser-noise-dominates": "A laser's intensity noise or broadband floor adds more noise than the shot noise does.",
  "nedt-unmet": "The channel's NEΔT is above its requirement.",
  "in-protected-band": "A passband lies wholly inside a band where all emissions are prohibited (passive use).",
  "schedule-overrun": "The dwells of the laser pair's observation schedule add up to more than its cycle.",
  "retune-blocked":
    "Retuning laser 2 between two chains of a schedule would cross LO offsets outside the laser's reach.",
  "shared-nedt-unmet":
    "The channel would meet its NEΔT requirement with the laser pair to itself; its share of the schedule is too small.",
  "carrier-outside-telecom":
    "The laser carrier lies outside the telecom bands (1260–1675 nm): check the value and its unit.",
  "q-beyond-lithium-niobate":
    "The resonator's loaded Q is above what lithium niobate resonators have been shown to reach.",
  "receiver-noise-implausible": "The receiver noise temperature is above 10⁶ K, far beyond any radiometer receiver.",
};

const byCode: Readonly<Record<string, string | undefined>> = TEXT;

export function explainCode(code: string): string {
  return byCode[code] ?? `Rule ${code}.`;
}
