/** One titled section of the printable report, kept on one page where it fits. */
export function Section({ title, children }: { title: string; children: React.ReactNode }) {
  return (
    <section className="mt-6 break-inside-avoid-page">
      <h2 className="mb-1.5 border-b-2 border-ink pb-0.5 text-base font-semibold">{title}</h2>
      {children}
    </section>
  );
}

/** Cell styles of the report's tables. */
export const th = "border-b border-ink/30 px-1.5 py-1 text-left text-[11px] font-semibold text-ink-soft";
export const td = "border-b border-ink/10 px-1.5 py-1 align-top tabular-nums";
