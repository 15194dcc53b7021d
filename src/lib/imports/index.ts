export { decodeUtf8 } from "./decodeUtf8";
export { mergeReach, type ReachMerge } from "./mergeReach";
export { parseTuningMap, type TuningMapParse, type TuningMapPreview } from "./parseTuningMap";
export { usableBand, type ResponsePoint, type UsableBand } from "./usableBand";
export { parseDetectorResponse, type DetectorResponseParse } from "./parseDetectorResponse";
export { parseChannelCsv, type ChannelCsvParse, type ChannelCsvRow } from "./parseChannelCsv";
export { channelsToCsv, type ChannelCsvSource } from "./channelsToCsv";
export { MAX_DATA_ROWS, type FileIssue } from "./internals/csv";
export { CHANNEL_COLUMNS } from "./internals/channelColumns";
