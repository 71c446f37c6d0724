import type { ButtonHTMLAttributes, Ref } from 'react';

type Variant = 'primary' | 'secondary' | 'quiet';

const variants: Record<Variant, string> = {
  // White on oxide passes AA (4.9:1); keep one primary button per screen.
  primary: 'bg-oxide text-white hover:bg-[#9c4622] disabled:opacity-60',
  secondary: 'border border-edge bg-white text-ink hover:border-ink disabled:opacity-60',
  quiet: 'text-ink underline-offset-4 hover:underline',
};

/** Classes for anything that should look like a button (also links). */
export function buttonClasses(variant: Variant = 'primary'): string {
  return `inline-flex min-h-11 items-center justify-center gap-2 rounded-lg px-4 py-2 font-bold transition-colors ${variants[variant]}`;
}

type Props = ButtonHTMLAttributes<HTMLButtonElement> & { variant?: Variant; busy?: boolean; ref?: Ref<HTMLButtonElement> };

/**
 * A button. While `busy` (its action under way) it keeps its place in the tab order and keyboard focus, says so with
 * `aria-disabled` and `aria-busy`, and ignores presses — a `disabled` button would drop focus to the page's top.
 */
export function Button({ variant = 'primary', busy = false, className = '', children, disabled, onClick, ...rest }: Props) {
  return (
    <button
      type="button"
      {...rest}
      disabled={disabled}
      aria-disabled={busy || undefined}
      aria-busy={busy || undefined}
      onClick={(event) => {
        // preventDefault also stops a submit button from sending its form again.
        if (busy) event.preventDefault();
        else onClick?.(event);
      }}
      className={`${buttonClasses(variant)} ${busy ? 'cursor-progress opacity-60' : ''} ${className}`}
    >
      {children}
    </button>
  );
}
