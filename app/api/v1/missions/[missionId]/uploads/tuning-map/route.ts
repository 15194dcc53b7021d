import { tuningMapQuerySchema } from "@/schemas/workspace";
import { getMissionRow, guarded, json } from "@/server/core";
import { CAN, readUploadedFile, uploadTuningMap } from "@/server/workspace";

export const POST = guarded(
  CAN.import,
  { what: "upload files", params: ["missionId"], query: tuningMapQuerySchema, input: "query" },
  async ({ request, actor, params, query }) => {
    await getMissionRow(actor, params.missionId);
    const file = await readUploadedFile(request);
    return json(await uploadTuningMap(actor, params.missionId, query, file));
  },
);
