export { decodeUtf8 } from "./decode-utf8";
export { mergeReach, type ReachMerge } from "./merge-reach";
export { parseTuningMap, type TuningMapParse, type TuningMapPreview } from "./parse-tuning-map";
export { usableBand, type ResponsePoint, type UsableBand } from "./usable-band";
export { parseDetectorResponse, type DetectorResponseParse } from "./parse-detector-response";
export { parseChannelCsv, type ChannelCsvParse, type ChannelCsvRow } from "./parse-channel-csv";
export { channelsToCsv, type ChannelCsvSource } from "./channels-to-csv";
export { MAX_DATA_ROWS, type FileIssue } from "./internals/csv";
export { CHANNEL_COLUMNS } from "./internals/channel-columns";
