import type { ReactNode } from 'react';

type Props = { children: ReactNode };

/**
 * A step's action kept in reach: on a phone it sticks to the bottom of the screen while the list above it scrolls
 * (and comes to rest under the list); on wider screens it sits in place.
 */
export function ActionBar({ children }: Props) {
  return (
    <div className="sticky bottom-0 z-10 -mx-4 flex flex-col gap-2 border-t border-ink/15 bg-linen px-4 py-3 shadow-[0_-4px_12px_rgba(30,42,54,0.08)] sm:static sm:mx-0 sm:border-0 sm:bg-transparent sm:p-0 sm:shadow-none">
      {children}
    </div>
  );
}
