import type { ReactNode } from 'react';

type Props = { tone: 'caution' | 'danger' | 'info'; title: string; children?: ReactNode; action?: ReactNode };

const looks = {
  caution: { border: 'border-amber', mark: '!', word: 'Caution' },
  danger: { border: 'border-brick', mark: '✕', word: 'Stop' },
  info: { border: 'border-sage', mark: 'i', word: 'Note' },
} as const;

/**
 * A message that must be seen (skin-test rule, a refused move). The tone shows as a
 * thick border and a marked badge; the words carry the meaning, in ink for contrast.
 */
export function Notice({ tone, title, children, action }: Props) {
  const look = looks[tone];
  return (
    <div
      role={tone === 'info' ? 'status' : 'alert'}
      className={`flex flex-col gap-2 rounded-lg border-l-8 bg-white px-4 py-3 ring-1 ring-ink/10 ${look.border}`}
    >
      <p className="flex items-center gap-2 font-bold">
        <span aria-hidden="true" className={`inline-flex size-6 items-center justify-center rounded-full border-2 text-sm ${look.border}`}>
          {look.mark}
        </span>
        <span className="sr-only">{look.word}: </span>
        {title}
      </p>
      {children && <div className="text-ink">{children}</div>}
      {action}
    </div>
  );
}
