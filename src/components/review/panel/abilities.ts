/** What the viewer's role lets them do in the review panel (a hint only: the server checks every action). */
export interface ReviewAbilities {
  canSubmit: boolean;
  canDecide: boolean;
  canWaive: boolean;
  canComment: boolean;
  /** The signed-in person (their own @mention notifies nobody). */
  userId?: string;
}

/** An ISO time as "YYYY-MM-DD HH:MM UTC". */
export const when = (iso: string) => new Date(iso).toISOString().slice(0, 16).replace("T", " ") + " UTC";
