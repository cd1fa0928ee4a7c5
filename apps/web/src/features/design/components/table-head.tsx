/** The heading row of a design table: names written as the trade writes them (σ′p, Cα), never upper-cased. */
export function TableHead({ headings, cellClassName = 'px-3 py-2' }: { headings: readonly string[]; cellClassName?: string }) {
  return (
    <thead className="bg-slate-50 text-xs text-slate-600">
      <tr>
        {headings.map((heading) => (
          <th key={heading} scope="col" className={`whitespace-nowrap font-medium ${cellClassName}`}>
            {heading}
          </th>
        ))}
      </tr>
    </thead>
  );
}
