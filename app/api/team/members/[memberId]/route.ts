import { errorResponse, readJsonBody } from "@/server/http";
import { changeMemberRole, removeMember } from "@/server/team/service";

/** Changes a member's role (owner only). Body: { role }. */
export async function PATCH(request: Request, { params }: { params: Promise<{ memberId: string }> }) {
  try {
    const { memberId } = await params;
    const body = await readJsonBody(request, 10_000);
    const role = typeof body === "object" && body !== null ? (body as { role?: unknown }).role : undefined;
    return Response.json(await changeMemberRole(request.headers, { memberId, role }));
  } catch (err) {
    return errorResponse(err);
  }
}

/** Removes a member from the team (owner only; never the last owner). */
export async function DELETE(request: Request, { params }: { params: Promise<{ memberId: string }> }) {
  try {
    const { memberId } = await params;
    return Response.json(await removeMember(request.headers, { memberId }));
  } catch (err) {
    return errorResponse(err);
  }
}
