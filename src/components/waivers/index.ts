export { WaivedMark } from "./waived-mark";
export { useWaivers } from "./use-waivers";
export {
  errorCountText,
  waiverText,
  waiverOf,
  waivedErrorCount,
  type WaiverMap,
  type WaiverNote,
} from "./waiver-words";
