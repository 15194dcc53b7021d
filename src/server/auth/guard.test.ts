import { beforeEach, describe, expect, it, vi } from "vitest";

// The guard's collaborators, replaced so the test can count how often the
// session and the member row are read (the guard's own logic is what is
// tested; the real reads are exercised by the integration tests).
const api = vi.hoisted(() => ({ getSession: vi.fn(), getActiveMember: vi.fn() }));
const queries = vi.hoisted(() => ({ memberRole: vi.fn() }));
vi.mock("./auth", () => ({ auth: { api } }));
vi.mock("./queries", () => queries);
vi.mock("next/headers", () => ({ headers: async () => new Headers() }));

const { getActor, readActor, requireActor } = await import("./guard");
type Permission = NonNullable<Parameters<typeof requireActor>[1]>;

const user = { id: "u1", email: "erin@example.org", name: "Erin" };
const session = (teamId: string | null) => ({ user, session: { activeOrganizationId: teamId } });

beforeEach(() => {
  api.getSession.mockReset();
  api.getActiveMember.mockReset();
  queries.memberRole.mockReset();
});

describe("requireActor reads the caller once", () => {
  const edit: Permission = { plan: ["edit"] };
  const cases: {
    name: string;
    session: ReturnType<typeof session> | null;
    role: string | null;
    permission?: Permission;
    status: number;
    roleReads: number;
  }[] = [
    { name: "signed out", session: null, role: null, status: 401, roleReads: 0 },
    { name: "no active team", session: session(null), role: null, status: 403, roleReads: 0 },
    {
      name: "not a member of the active team",
      session: session("t1"),
      role: null,

      status: 403,
      roleReads: 1,
    },
    {
      name: "a role that may not act",
      session: session("t1"),
      role: "viewer",
      permission: edit,
      status: 403,
      roleReads: 1,
    },
    {
      name: "a role that may act",
      session: session("t1"),
      role: "engineer",
      permission: edit,
      status: 200,
      roleReads: 1,
    },
    { name: "any member", session: session("t1"), role: "viewer", status: 200, roleReads: 1 },
  ];

  it.each(cases)("$name: one getSession, $roleReads role query, answer $status", async (c) => {
    api.getSession.mockResolvedValue(c.session);
    queries.memberRole.mockResolvedValue(c.role);
    const outcome = await requireActor(new Headers(), c.permission, "act").then(
      (actor) => ({ status: 200, actor }),
      (err: { status: number }) => ({ status: err.status, actor: null }),
    );
    expect(outcome.status).toBe(c.status);
    if (c.status === 200)
      expect(outcome.actor).toEqual({ userId: "u1", email: user.email, name: "Erin", teamId: "t1", role: c.role });
    expect(api.getSession).toHaveBeenCalledTimes(1);
    expect(queries.memberRole).toHaveBeenCalledTimes(c.roleReads);
    expect(api.getActiveMember).not.toHaveBeenCalled();
  });

  it("getActor and readActor read the session once too", async () => {
    api.getSession.mockResolvedValue(session("t1"));
    queries.memberRole.mockResolvedValue("lead");
    expect((await getActor(new Headers()))?.role).toBe("lead");
    const read = await readActor(new Headers());
    expect(read.session).toEqual(session("t1"));
    expect(api.getSession).toHaveBeenCalledTimes(2);
    expect(queries.memberRole).toHaveBeenCalledWith("u1", "t1");
  });
});
