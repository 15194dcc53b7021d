import { channelsUploadQuerySchema } from "@/schemas/workspace";
import { CAN, getMissionRow, guarded, json, readUploadedFile, uploadChannels } from "@/server/workspace";
import { parseOr400 } from "@/server/workspace/errors";

export const POST = guarded<"missionId">(CAN.import, "upload files", async ({ request, actor, params, query }) => {
  await getMissionRow(actor, params.missionId);
  const q = parseOr400(channelsUploadQuerySchema, query, "query");
  const file = await readUploadedFile(request);
  return json(await uploadChannels(actor, params.missionId, q.apply, file));
});
