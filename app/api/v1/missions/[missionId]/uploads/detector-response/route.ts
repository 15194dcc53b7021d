import { detectorResponseQuerySchema } from "@/schemas/workspace";
import { CAN, getMissionRow, guarded, json, readUploadedFile, uploadDetectorResponse } from "@/server/workspace";
import { parseOr400 } from "@/server/workspace/errors";

export const POST = guarded<"missionId">(CAN.import, "upload files", async ({ request, actor, params, query }) => {
  await getMissionRow(actor, params.missionId);
  const q = parseOr400(detectorResponseQuerySchema, query, "query");
  const file = await readUploadedFile(request);
  return json(await uploadDetectorResponse(actor, params.missionId, q, file));
});
