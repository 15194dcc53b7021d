"use server";
import { revalidatePath } from "next/cache";
import { createTokenSchema, tokenIdSchema } from "@/schemas/api-tokens";
import { createToken, revokeToken } from "@/server/api-tokens/service";
import { formAction, stateAction, type ActionState } from "@/server/core";

export type { ActionState };

/** Makes a personal API token; the secret comes back once in the reply. Session only (never a token). */
export const createTokenAction = formAction(
  { access: "signed-in", schema: createTokenSchema },
  async ({ session, value, reply }) => {
    const { token, summary } = await createToken({ userId: session.user.id, name: session.user.name }, value);
    revalidatePath("/account");
    return { ...reply({ resetForm: true }), token, tokenName: summary.name };
  },
);

/** Revokes one of the person's tokens. */
export const revokeTokenAction = stateAction(
  { access: "signed-in", schema: tokenIdSchema },
  async ({ session, headers, value }) => {
    await revokeToken({ userId: session.user.id, name: session.user.name }, value.tokenId, headers);
    revalidatePath("/account");
    return { ok: "Token revoked." };
  },
);
