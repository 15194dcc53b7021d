import { detectorResponseQuerySchema } from "@/schemas/workspace";
import { getMissionRow, guarded, json } from "@/server/core";
import { CAN, readUploadedFile, uploadDetectorResponse } from "@/server/workspace";

export const POST = guarded(
  CAN.import,
  { what: "upload files", params: ["missionId"], query: detectorResponseQuerySchema, input: "query" },
  async ({ request, actor, params, query }) => {
    await getMissionRow(actor, params.missionId);
    const file = await readUploadedFile(request);
    return json(await uploadDetectorResponse(actor, params.missionId, query, file));
  },
);
