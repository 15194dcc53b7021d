/**
 * Shapes of the workspace JSON API as the client reads them, derived from
 * the code that produces them so they are written once:
 *
 * - entities and settings from the server's row → API mappers
 *   (`src/server/workspace/mappers.ts`), list rows from the server's read
 *   queries (`@/server/workspace`);
 * - the result document and its findings from the engine (`@/lib/plan`);
 * - upload previews from the file readers (`@/lib/imports`).
 *
 * Every import here is `import type`: TypeScript erases it, so no server
 * code (nor `server-only`) reaches the client bundle. Form inputs come from
 * the zod schemas in `src/schemas/workspace.ts`.
 */
import type { ChannelCsvParse, DetectorResponseParse, TuningMapPreview } from "@/lib/imports";
import type { ResultDocument } from "@/lib/plan";
import type {
  chainDto,
  channelDto,
  detectorDto,
  laserDto,
  missionDto,
  resonatorDto,
  settingsDto,
} from "@/server/workspace/mappers";
import type { listActivity, listMissions, listRevisions, RevisionInfo } from "@/server/workspace";

export type { Severity, Finding, ChainResult, ChannelResult } from "@/lib/plan";

type Stamp = "createdAt" | "updatedAt";
/**
 * A mapped row as the client holds it. The timestamps are optional because
 * the client never reads them and builds rows without them (optimistic
 * edits, tests).
 */
type ClientRow<T> = Omit<T, Stamp> & Partial<Pick<T, Extract<keyof T, Stamp>>>;

/** One element of the list a server read query resolves to. */
type Item<F extends (...args: never[]) => unknown> = Awaited<ReturnType<F>> extends readonly (infer E)[] ? E : never;

export type Mission = ClientRow<ReturnType<typeof missionDto>>;
export type Laser = ClientRow<ReturnType<typeof laserDto>>;
export type Resonator = ClientRow<ReturnType<typeof resonatorDto>>;
export type Detector = ClientRow<ReturnType<typeof detectorDto>>;
export type Chain = ClientRow<ReturnType<typeof chainDto>>;
export type Channel = ClientRow<ReturnType<typeof channelDto>>;
export type Settings = ClientRow<ReturnType<typeof settingsDto>>;

/** A closed GHz interval (a laser's reach, a chain's RF input). */
export type Interval = Laser["reach"][number];

/** One row of the mission list. */
export type MissionSummary = Item<typeof listMissions>;
export type RevisionSummary = Item<typeof listRevisions>;
export type ActivityEntry = Item<typeof listActivity>;

/** The result document as the engine defines it. */
export type PlanResult = ResultDocument;

/** What a saving call adds to its reply: the revision the server stored and its counts. */
export interface MutationRevision {
  revision?: RevisionInfo;
}

/** The preview replies of the uploads: what the file readers return when a file is read. */
type Read<P> = Omit<Extract<P, { ok: true }>, "ok">;
export type TuningPreview = TuningMapPreview;
export type ChannelUploadPreview = Read<ChannelCsvParse>;
export type DetectorResponsePreview = Read<DetectorResponseParse>;
