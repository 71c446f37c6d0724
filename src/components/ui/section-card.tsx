import { useId, type ReactNode } from 'react';

type Props = { title: string; children: ReactNode; className?: string };

/** A titled white panel; the title names the region for assistive technology. */
export function SectionCard({ title, children, className = '' }: Props) {
  const headingId = useId();
  return (
    <section aria-labelledby={headingId} className={`rounded-2xl bg-white p-5 shadow-sm ring-1 ring-ink/10 ${className}`}>
      <h2 id={headingId} className="mb-3 text-xl font-bold">
        {title}
      </h2>
      {children}
    </section>
  );
}
