import type { FindingsCollector } from "../findings-collector";
import { fBand, fDB, pair } from "../format";
import type { OffsetState } from "../offset-state";
import { fallsShort } from "../tolerance";

/** The image rule (docs/plan-format.md §4.1 "The rules"): `image-response`, per SSB channel with a slot. */
export function imageRules(at: OffsetState, out: FindingsCollector): void {
  const required = at.ctx.plan.settings.imageRejectionDB;
  at.channels.forEach(({ ch, image }, i) => {
    if (!image || image.rejectionDB === null || !fallsShort(image.rejectionDB, required)) return;
    out.add(
      "image-response",
      i,
      `The image band ${fBand(image.imageGHz)} of ${ch.channel.id} is rejected by only ${fDB(image.rejectionDB)} dB; at least ${fDB(required)} dB is required (${fDB(required - image.rejectionDB)} dB short).`,
      { imageGHz: pair(image.imageGHz), imageRejectionDB: image.rejectionDB, requiredDB: required },
    );
  });
}
