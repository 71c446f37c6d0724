import type { ColumnsBy } from '../lay-out-day';

type Props = { value: ColumnsBy; onChange: (by: ColumnsBy) => void };

const choices: { by: ColumnsBy; label: string }[] = [
  { by: 'stylist', label: 'By stylist' },
  { by: 'chair', label: 'By chair' },
];

/** Switch the timeline between stylist columns and chair columns (the chair view). */
export function ColumnsToggle({ value, onChange }: Props) {
  return (
    <div role="group" aria-label="Columns" className="inline-flex rounded-lg bg-white p-1 ring-1 ring-ink/20">
      {choices.map(({ by, label }) => (
        <button
          key={by}
          type="button"
          aria-pressed={value === by}
          onClick={() => onChange(by)}
          className="min-h-11 rounded-md px-4 font-bold aria-pressed:bg-ink aria-pressed:text-white"
        >
          {label}
        </button>
      ))}
    </div>
  );
}
