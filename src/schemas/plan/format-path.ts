/** A path into the document: object keys and array indices. */
export type PathSegment = string | number;

export { formatPath } from "../issues";
