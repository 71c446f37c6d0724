import type { ReactNode } from 'react';

type Props = { tone?: 'error' | 'success'; children: ReactNode };

/** A message about a whole form (not one field), announced when it appears. */
export function FormAlert({ tone = 'error', children }: Props) {
  const look = tone === 'error' ? 'border-brick text-brick' : 'border-sage text-ink';
  return (
    <div role={tone === 'error' ? 'alert' : 'status'} className={`rounded-lg border-l-4 bg-white px-4 py-3 font-bold ${look}`}>
      {children}
    </div>
  );
}
