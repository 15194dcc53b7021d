export { findingKeyOf as findingKey } from "./internals/finding-key";
