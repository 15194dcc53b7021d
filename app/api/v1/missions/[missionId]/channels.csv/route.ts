import { channelsToCsv } from "@/lib/imports";
import { getMissionRow, guarded } from "@/server/core";
import { CAN, listChannelsForCsv } from "@/server/workspace";

export const GET = guarded(
  CAN.export,
  { what: "export channels", params: ["missionId"] },
  async ({ actor, params }) => {
    const m = await getMissionRow(actor, params.missionId);
    const csv = channelsToCsv(await listChannelsForCsv(m.id));
    const file = `${m.name.replace(/[^A-Za-z0-9._-]+/g, "-").replace(/^-+|-+$/g, "") || "mission"}-channels.csv`;
    return new Response(csv, {
      headers: {
        "content-type": "text/csv; charset=utf-8",
        "content-disposition": `attachment; filename="${file}"`,
      },
    });
  },
);
