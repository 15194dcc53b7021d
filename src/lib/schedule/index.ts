export { timelineSegments, type TimelineSegment } from "./timeline-segments";
