import { Toaster } from 'sonner';

/**
 * Where short confirmations appear (sonner): bottom right, or along the bottom on a phone, read out politely, each
 * with a close button and gone after six seconds (longer while hovered or focused).
 */
export function Toasts() {
  return (
    <Toaster
      position="bottom-right"
      closeButton
      duration={6_000}
      toastOptions={{
        className: 'font-sans',
        style: { fontSize: '1rem', color: '#1E2A36', borderColor: 'rgb(30 42 54 / 0.45)' },
      }}
    />
  );
}
