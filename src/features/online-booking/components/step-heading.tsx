import { useEffect, useRef, type ReactNode } from 'react';

type Props = { children: ReactNode; focusOnMount: boolean };

/**
 * A step's heading. When the flow moves on, focus lands here so keyboard and
 * screen-reader users start the new step at its top instead of on a vanished button.
 */
export function StepHeading({ children, focusOnMount }: Props) {
  const ref = useRef<HTMLHeadingElement>(null);
  useEffect(() => {
    if (focusOnMount) ref.current?.focus();
  }, [focusOnMount]);
  return (
    <h2 ref={ref} tabIndex={-1} className="text-2xl font-extrabold tracking-tight">
      {children}
    </h2>
  );
}
