import { useState } from "react";
import type { ResultDocument } from "@/lib/plan";
import type { Plan } from "@/schemas/plan";

export interface SaveOutcome {
  revision: number | null;
  errors: number;
  warnings: number;
  /** The server's own re-check of the saved plan, when it sent one. */
  result: ResultDocument | null;
}

/** Where one chain's save stands: in flight, and the message of its last outcome. */
export type SaveState = Record<string, { busy: boolean; message: string | null; error: boolean }>;

/** Saving a chain's LO as a new plan revision, with the state of each chain's save. */
export function useLoSave(
  plan: Plan,
  onSaveLo: ((chainId: string, loOffsetGHz: number) => Promise<SaveOutcome>) | undefined,
) {
  const [saveState, setSaveState] = useState<SaveState>({});
  const save = async (chainId: string) => {
    if (!onSaveLo) return;
    const c = plan.chains.find((x) => x.id === chainId);
    if (!c) return;
    setSaveState((s) => ({ ...s, [chainId]: { busy: true, message: null, error: false } }));
    try {
      const out = await onSaveLo(chainId, c.loOffsetGHz);
      setSaveState((s) => ({
        ...s,
        [chainId]: {
          busy: false,
          error: false,
          message: `Saved as revision ${out.revision ?? "?"}; the server re-checked it: ${out.errors} errors, ${out.warnings} warnings.`,
        },
      }));
    } catch (e) {
      setSaveState((s) => ({ ...s, [chainId]: { busy: false, error: true, message: (e as Error).message } }));
    }
  };
  return { saveState, save };
}
