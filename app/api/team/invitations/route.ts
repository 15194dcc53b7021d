import { errorResponse, readJsonBody } from "@/server/http";
import { inviteMember } from "@/server/team/service";

/** Invites a person by e-mail with a role (lead or owner; only an owner may invite an owner). */
export async function POST(request: Request) {
  try {
    const body = await readJsonBody(request, 10_000);
    return Response.json(await inviteMember(request.headers, body), { status: 201 });
  } catch (err) {
    return errorResponse(err);
  }
}
