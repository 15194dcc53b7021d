import { describe, expect, it } from "vitest";
import { ApiError } from "./api";
import { confirmEditDuringReview, editDuringReviewQuestion, missionOfApplyingUpload } from "./edit-during-review";

const inReview = async () => ({ state: "in-review", revision: { number: 7 } });

describe("confirmEditDuringReview", () => {
  it("asks while in review, naming the revision and the consequence, and saves on yes", async () => {
    const asked: string[] = [];
    await confirmEditDuringReview("m1", (q) => (asked.push(q), true), inReview);
    expect(asked).toHaveLength(1);
    expect(asked[0]).toContain("Revision 7 is in review");
    expect(asked[0]).toContain("withdraws");
    expect(asked[0]).toContain("e-mail");
  });

  it("refuses with not-saved on no", async () => {
    const err = await confirmEditDuringReview("m1", () => false, inReview).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(ApiError);
    expect((err as ApiError).code).toBe("not-saved");
    expect((err as ApiError).message).toContain("revision 7 stays in review");
  });

  it("does not ask in any other state, or when the state cannot be read", async () => {
    for (const state of ["draft", "baselined", "changes-requested"])
      await confirmEditDuringReview(
        "m1",
        () => {
          throw new Error(`asked in ${state}`);
        },
        async () => ({ state, revision: { number: 2 } }),
      );
    await confirmEditDuringReview(
      "m1",
      () => {
        throw new Error("asked without a state");
      },
      async () => {
        throw new ApiError(403, "forbidden", "no");
      },
    );
  });

  it("reads the mission's review overview", async () => {
    const urls: string[] = [];
    await confirmEditDuringReview(
      "a b",
      () => true,
      async (u) => (urls.push(u), { state: "draft", revision: null }),
    );
    expect(urls).toEqual(["/api/v1/missions/a%20b/review"]);
  });

  it("question text", () => {
    expect(editDuringReviewQuestion(3)).toMatch(/^Revision 3 is in review\./);
  });
});

describe("missionOfApplyingUpload", () => {
  it("finds the mission of an applying upload and nothing for a preview", () => {
    expect(missionOfApplyingUpload("/api/v1/missions/abc/uploads/channels?apply=1")).toBe("abc");
    expect(missionOfApplyingUpload("/api/v1/missions/abc/uploads/tuning-map?laserId=x&gapMHz=5&apply=1")).toBe("abc");
    expect(missionOfApplyingUpload("/api/v1/missions/abc/uploads/channels?apply=0")).toBeNull();
    expect(missionOfApplyingUpload("/api/v1/missions/abc/uploads/channels?apply=10")).toBeNull();
    expect(missionOfApplyingUpload("/api/v1/missions/abc/channels?apply=1")).toBeNull();
  });
});
