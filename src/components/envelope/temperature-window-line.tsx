import { fmtNumber, fmtWindow } from "./format";

/**
 * A chain's temperature window and the margin of its temperature control
 * ±Te inside it, in one line for the chain card (docs/decisions/029):
 * red when the window is empty or the margin negative.
 */
export function TemperatureWindowLine({
  chainId,
  excursionK,
  windowK,
  marginK,
}: {
  chainId: string;
  excursionK: number;
  windowK: readonly (readonly [number, number])[] | undefined;
  marginK: number | null | undefined;
}) {
  if (!windowK) return null;
  const bad = windowK.length === 0 || (marginK ?? -1) < 0;
  const verdict =
    windowK.length === 0
      ? "no temperature passes at this LO"
      : marginK === null || marginK === undefined
        ? ""
        : marginK < 0
          ? `the control must tighten by ${fmtNumber(-marginK, 3)} K`
          : `margin ${fmtNumber(marginK, 3)} K`;
  return (
    <div
      className={`mt-1 text-xs ${bad ? "text-sev-error" : "text-ink-soft"}`}
      data-testid={`temperature-window-${chainId}`}
    >
      Temperature window {fmtWindow(windowK)} · control ±{fmtNumber(excursionK, 3)} K{verdict ? ` · ${verdict}` : ""}
    </div>
  );
}
