import { channelsUploadQuerySchema } from "@/schemas/workspace";
import { getMissionRow, guarded, json } from "@/server/core";
import { CAN, readUploadedFile, uploadChannels } from "@/server/workspace";

export const POST = guarded(
  CAN.import,
  { what: "upload files", params: ["missionId"], query: channelsUploadQuerySchema, input: "query" },
  async ({ request, actor, params, query }) => {
    await getMissionRow(actor, params.missionId);
    const file = await readUploadedFile(request);
    return json(await uploadChannels(actor, params.missionId, query, file));
  },
);
