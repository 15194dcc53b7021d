import { errorResponse } from "@/server/http";
import { cancelInvitation } from "@/server/team/service";

export async function DELETE(request: Request, { params }: { params: Promise<{ id: string }> }) {
  try {
    const { id } = await params;
    return Response.json(await cancelInvitation(request.headers, { invitationId: id }));
  } catch (err) {
    return errorResponse(err);
  }
}
