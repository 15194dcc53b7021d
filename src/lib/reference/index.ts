export { PROTECTED_BANDS, protectedBandHolding, type ProtectedBand } from "./protected-bands";
export { LINE_CENTRES, type LineCentre } from "./line-centres";
