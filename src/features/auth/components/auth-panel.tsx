import type { ReactNode } from 'react';

type Props = { title: string; intro?: ReactNode; children: ReactNode; footer?: ReactNode };

/** The calm, narrow frame every sign-in and account page shares. */
export function AuthPanel({ title, intro, children, footer }: Props) {
  return (
    <div className="mx-auto w-full max-w-md py-6 sm:py-12">
      <div className="rounded-2xl bg-white p-6 shadow-sm ring-1 ring-ink/10 sm:p-8">
        <h1 className="text-3xl font-extrabold tracking-tight">{title}</h1>
        {intro && <div className="mt-2 text-ink/80">{intro}</div>}
        <div className="mt-6">{children}</div>
      </div>
      {footer && <div className="mt-6 flex flex-col items-center gap-2 text-center">{footer}</div>}
    </div>
  );
}
