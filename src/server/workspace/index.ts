export * from "./queries";
export * from "./missions";
export * from "./entities";
export * from "./plan-io";
export * from "./uploads";
export { uploadChannels, prepareChannelUpload, applyPreparedChannels } from "./channel-upload";
export { saveAndCheck, stageRevision, prepareCheck, type ActivityNote, type RevisionInfo } from "./save-and-check";
export { assemblePlan } from "./assemble";
export { CAN } from "./can";
