import type { ReactNode } from 'react';

type Props = { title: string; subtitle?: ReactNode; action?: ReactNode };

/** The one h1 of a page, with an optional line under it and the page's main action beside it. */
export function PageHeader({ title, subtitle, action }: Props) {
  return (
    <div className="mb-6 flex flex-wrap items-end justify-between gap-4">
      <div>
        <h1 className="text-3xl font-extrabold tracking-tight">{title}</h1>
        {subtitle && <div className="mt-1 text-ink/80">{subtitle}</div>}
      </div>
      {action}
    </div>
  );
}
