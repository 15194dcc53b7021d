/** The head row of a settings page's list table: the column names, then a column of actions named for screen readers. */
export function ListHead({ columns }: { columns: readonly string[] }) {
  return (
    <thead className="text-left text-xs uppercase tracking-wide text-ink-soft">
      <tr>
        {columns.map((c) => (
          <th key={c} className="px-4 py-2 font-medium">
            {c}
          </th>
        ))}
        <th className="px-4 py-2 font-medium">
          <span className="sr-only">Actions</span>
        </th>
      </tr>
    </thead>
  );
}
