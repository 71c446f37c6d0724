type Props = { label?: string };

/** A calm placeholder while data or code loads; announced once to screen readers. */
export function LoadingState({ label = 'Loading…' }: Props) {
  return (
    <div role="status" className="flex items-center gap-3 py-12 text-ink/80">
      <span aria-hidden="true" className="size-4 animate-spin rounded-full border-2 border-oxide border-t-transparent" />
      {label}
    </div>
  );
}
