import "server-only";
import { createHash } from "node:crypto";
import { and, eq } from "drizzle-orm";
import { db } from "@db/client";
import { detectors, lasers, uploads } from "@db/schema";
import { decodeUtf8, parseDetectorResponse, parseTuningMap, type FileIssue } from "@/lib/imports";
import { textProblem } from "@/schemas/fields";
import { UPLOAD_MAX_BYTES, type DetectorResponseQuery, type TuningMapQuery } from "@/schemas/workspace";
import type { Actor } from "@/server/auth/actor";
import { readBodyBytes } from "@/server/core/body";
import { inTransaction, type Tx } from "@/server/core/db";
import { HttpError, notFound, type Issue } from "@/server/core/http";
import { getMissionRow, lockMission } from "@/server/core/mission-scope";
import { detectorDto, laserDto } from "./mappers";
import { saveAndCheck } from "./save-and-check";

export interface UploadedFile {
  filename: string;
  bytes: Buffer;
}

const tooLarge = () =>
  new HttpError(413, "too-large", `The file is larger than ${UPLOAD_MAX_BYTES / (1024 * 1024)} MB; nothing was saved.`);

/** Multipart overhead allowed above the file limit (boundaries, part headers, other fields). */
const MULTIPART_SLACK = 64 * 1024;

/**
 * Reads the multipart/form-data field `file` of an upload with a hard size
 * limit: a declared or streamed body above the limit answers 413 without
 * buffering it all (the core's one body reader). Wrong content type, a
 * missing field, a file that is not CSV by name or type, a file name with
 * control characters answer 400.
 */
export async function readUploadedFile(request: Request): Promise<UploadedFile> {
  const type = request.headers.get("content-type") ?? "";
  if (!type.toLowerCase().startsWith("multipart/form-data"))
    throw new HttpError(400, "invalid-input", 'Send the file as multipart/form-data in the field "file".', [
      { path: "file", message: "missing (the request is not multipart/form-data)" },
    ]);
  const limit = UPLOAD_MAX_BYTES + MULTIPART_SLACK;
  let bytes: Uint8Array;
  try {
    bytes = await readBodyBytes(request, limit, "file");
  } catch (e) {
    if (e instanceof HttpError && e.status === 413) throw tooLarge();
    throw e;
  }
  let form: FormData;
  try {
    form = await new Response(new Uint8Array(bytes), { headers: { "content-type": type } }).formData();
  } catch {
    throw new HttpError(400, "invalid-input", "The multipart body could not be read.", [
      { path: "file", message: "malformed multipart/form-data" },
    ]);
  }
  const file = form.get("file");
  if (!file || typeof file === "string")
    throw new HttpError(400, "invalid-input", "No file was sent.", [{ path: "file", message: "is required" }]);
  if (file.size > UPLOAD_MAX_BYTES) throw tooLarge();
  const name = file.name || "upload.csv";
  const nameProblem = textProblem(name);
  if (nameProblem)
    throw new HttpError(400, "invalid-input", `The file name ${nameProblem}; nothing was saved.`, [
      { path: "file", message: `the file name ${nameProblem}` },
    ]);
  const mime = (file.type || "").toLowerCase();
  const csvByName = /\.(csv|txt)$/i.test(name);
  const csvByType =
    mime === "" ||
    /^(text\/csv|text\/plain|application\/csv|application\/vnd\.ms-excel|application\/octet-stream)/.test(mime);
  if (!csvByName || !csvByType)
    throw new HttpError(
      400,
      "invalid-input",
      `"${name}" is not a CSV file (type ${mime || "unknown"}); nothing was saved.`,
      [{ path: "file", message: "must be a .csv text file" }],
    );
  return { filename: name, bytes: Buffer.from(await file.arrayBuffer()) };
}

/** At most this many issues are listed for a refused file (the message gives the total). */
const MAX_LISTED_ISSUES = 200;

function fileIssues(issues: FileIssue[]): Issue[] {
  return issues.map((i) => ({
    path:
      [i.row !== null ? `row ${i.row}` : null, i.column !== null ? `column ${i.column}` : null]
        .filter(Boolean)
        .join(", ") || "file",
    message: i.message,
    ...(i.row !== null ? { row: i.row } : {}),
    ...(i.column !== null ? { column: i.column } : {}),
  }));
}

export function badFile(issues: FileIssue[], filename: string): HttpError {
  const first = issues[0];
  const where = first
    ? [first.row !== null ? `row ${first.row}` : "", first.column ? `column ${first.column}` : ""]
        .filter(Boolean)
        .join(", ")
    : "";
  const more =
    issues.length > MAX_LISTED_ISSUES ? ` ${issues.length} problems; the first ${MAX_LISTED_ISSUES} are listed.` : "";
  return new HttpError(
    400,
    "invalid-file",
    `"${filename}" was not read${where ? ` (${where}: ${first?.message})` : first ? ` (${first.message})` : ""}; nothing was saved.${more}`,
    fileIssues(issues.slice(0, MAX_LISTED_ISSUES)),
  );
}

export function textOf(file: UploadedFile): string {
  const decoded = decodeUtf8(file.bytes);
  if (!decoded.ok) throw badFile([{ row: null, column: null, message: decoded.message }], file.filename);
  return decoded.text;
}

export async function storeUpload(
  tx: Tx,
  actor: Actor,
  missionId: string,
  kind: "tuning-map" | "channels" | "detector-response",
  file: UploadedFile,
) {
  await tx.insert(uploads).values({
    missionId,
    kind,
    filename: file.filename.slice(0, 255),
    sizeBytes: file.bytes.byteLength,
    sha256: createHash("sha256").update(file.bytes).digest("hex"),
    content: file.bytes,
    uploadedBy: actor.userId,
  });
}

/** Tuning map: preview the merged reach intervals, or apply them to the laser (replacing its reach). */
export async function uploadTuningMap(actor: Actor, missionId: string, q: TuningMapQuery, file: UploadedFile) {
  await getMissionRow(actor, missionId);
  const parsed = parseTuningMap(textOf(file), q.gapMHz);
  if (!parsed.ok) throw badFile(parsed.issues, file.filename);
  const preview = {
    intervals: parsed.intervals,
    points: parsed.points,
    isolatedGHz: parsed.isolatedGHz,
    rejectedRows: parsed.rejectedRows,
  };
  if (!q.apply) {
    const [laser] = await db
      .select({ id: lasers.id })
      .from(lasers)
      .where(and(eq(lasers.id, q.laserId), eq(lasers.missionId, missionId)));
    if (!laser) throw notFound("laser");
    return preview;
  }
  if (parsed.intervals.length === 0)
    throw new HttpError(
      400,
      "invalid-file",
      `"${file.filename}" gives no interval (every offset is isolated at gap ${q.gapMHz} MHz); nothing was saved.`,
      [{ path: "gapMHz", message: "no two offsets lie closer than this gap" }],
    );
  return inTransaction(async (tx) => {
    await lockMission(tx, actor, missionId);
    const [laser] = await tx
      .select()
      .from(lasers)
      .where(and(eq(lasers.id, q.laserId), eq(lasers.missionId, missionId)))
      .for("update");
    if (!laser) throw notFound("laser");
    const [row] = await tx
      .update(lasers)
      .set({ reach: parsed.intervals, version: laser.version + 1, updatedAt: new Date() })
      .where(eq(lasers.id, laser.id))
      .returning();
    await storeUpload(tx, actor, missionId, "tuning-map", file);
    const revision = await saveAndCheck(tx, missionId, actor, {
      action: "upload",
      entity: `laser ${laser.key}`,
      summary: `Applied tuning map "${file.filename}" to laser ${laser.key}: ${parsed.points} offsets → ${parsed.intervals.length} reach intervals (gap ${q.gapMHz} MHz).`,
    });
    return { ...laserDto(row!), revision, preview };
  });
}

/** Detector response: preview the usable band, or apply it to the detector's minGHz/maxGHz. */
export async function uploadDetectorResponse(
  actor: Actor,
  missionId: string,
  q: DetectorResponseQuery,
  file: UploadedFile,
) {
  await getMissionRow(actor, missionId);
  const parsed = parseDetectorResponse(textOf(file), q.dropDB);
  if (!parsed.ok) throw badFile(parsed.issues, file.filename);
  const preview = {
    minGHz: parsed.minGHz,
    maxGHz: parsed.maxGHz,
    peakDB: parsed.peakDB,
    peakGHz: parsed.peakGHz,
    points: parsed.points,
  };
  return inTransaction(async (tx) => {
    await lockMission(tx, actor, missionId);
    const [det] = await tx
      .select()
      .from(detectors)
      .where(and(eq(detectors.id, q.detectorId), eq(detectors.missionId, missionId)))
      .for("update");
    if (!det) throw notFound("detector");
    if (!q.apply) return preview;
    const [row] = await tx
      .update(detectors)
      .set({ minGHz: parsed.minGHz, maxGHz: parsed.maxGHz, version: det.version + 1, updatedAt: new Date() })
      .where(eq(detectors.id, det.id))
      .returning();
    await storeUpload(tx, actor, missionId, "detector-response", file);
    const revision = await saveAndCheck(tx, missionId, actor, {
      action: "upload",
      entity: `detector ${det.key}`,
      summary: `Applied detector response "${file.filename}" to detector ${det.key}: usable band ${parsed.minGHz}–${parsed.maxGHz} GHz (within ${q.dropDB} dB of the ${parsed.peakDB} dB peak).`,
    });
    return { ...detectorDto(row!), revision, preview };
  });
}
