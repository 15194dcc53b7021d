import type { FindingsCollector } from "../findings-collector";
import { fBand, fDB, pair } from "../format";
import { hasEnvelope, whereText } from "../envelope-text";
import { absInterval } from "../intervals";
import type { OffsetState } from "../offset-state";
import { fallsShort } from "../tolerance";

/**
 * The image rule (docs/plan-format.md §4.1 "The rules" and §12.5):
 * `image-response`, per SSB channel with a slot, on the lowest image
 * rejection over the operating envelope. `imageGHz` is the image band where
 * that lowest rejection occurs (the nominal image band when the envelope is
 * one point).
 */
export function imageRules(at: OffsetState, out: FindingsCollector): void {
  const required = at.ctx.plan.settings.imageRejectionDB;
  at.channels.forEach(({ ch, envelope }, i) => {
    const image = envelope.image;
    if (!image || !fallsShort(image.rejectionDB, required)) return;
    const band = absInterval(image.opticalImage);
    const where = hasEnvelope(at.box) ? ` ${whereText(at.box, image)}` : "";
    out.add(
      "image-response",
      i,
      `The image band ${fBand(band)} of ${ch.channel.id} is rejected by only ${fDB(image.rejectionDB)} dB${where}; at least ${fDB(required)} dB is required (${fDB(required - image.rejectionDB)} dB short).`,
      { imageGHz: pair(band), imageRejectionDB: image.rejectionDB, requiredDB: required },
    );
  });
}
