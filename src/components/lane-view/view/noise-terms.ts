import type { NoiseTerm } from "@/lib/plan";

/** Names, colours and the plain explanation of each noise-budget term (docs/plan-format.md §14.4). */
export const NOISE_TERM_TEXT: Readonly<Record<NoiseTerm, { name: string; colour: string; why: string }>> = {
  "front-end-loss": {
    name: "Front-end loss",
    colour: "#8c6d31",
    why: "the loss between the antenna and the resonator adds its own thermal noise and scales everything after it; a shorter or colder feed would cut it",
  },
  "quantum-limit": {
    name: "Quantum limit h·f/k",
    colour: "#393b79",
    why: "the heterodyne quantum limit at this frequency; nothing reduces it but a lower frequency",
  },
  "conversion-loss": {
    name: "Conversion and path loss",
    colour: "#6b6ecf",
    why: "the photon conversion efficiency η, the optical path and the quantum efficiency lose signal photons before the LO's shot noise; a higher η (more pump power, better coupling) cuts it",
  },
  "carrier-shot-noise": {
    name: "Residual-carrier shot noise",
    colour: "#d62728",
    why: "the carrier left at the detector adds shot noise in proportion P_c/P_LO; more carrier notch, coupling nearer critical or more LO power cut it",
  },
  "detector-noise": {
    name: "Detector current noise",
    colour: "#7f7f7f",
    why: "the amplifier's current noise compared with the LO's shot noise; more LO power or a quieter amplifier cut it",
  },
  "carrier-floor": {
    name: "Carrier laser floor",
    colour: "#e377c2",
    why: "the carrier laser's broadband floor where the signal is beats with the LO; a pre-filter on the carrier cuts it",
  },
  "lo-floor": {
    name: "LO laser floor",
    colour: "#bcbd22",
    why: "the LO laser's broadband floor beats with the residual carrier; a pre-filter on the LO or less carrier cut it",
  },
  "carrier-rin": {
    name: "Carrier RIN",
    colour: "#17becf",
    why: "the residual carrier's intensity noise left after the balanced pair's rejection; more CMRR or less carrier cut it",
  },
  "lo-rin": {
    name: "LO RIN",
    colour: "#2ca02c",
    why: "the LO's intensity noise left after the balanced pair's rejection; more CMRR or less LO power cut it",
  },
};
