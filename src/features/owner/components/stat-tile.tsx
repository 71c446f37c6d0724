type Props = { label: string; value: string; note?: string };

/** One number with its name; the name comes first for screen readers. */
export function StatTile({ label, value, note }: Props) {
  return (
    <div className="flex flex-col-reverse rounded-xl bg-linen px-4 py-3">
      <dt className="text-sm">
        {label}
        {note && <span className="block text-xs text-ink/80">{note}</span>}
      </dt>
      <dd className="text-3xl font-extrabold tabular">{value}</dd>
    </div>
  );
}
