import { toast } from 'sonner';

/*
 * Short confirmations after an action, through one toast package (sonner, shown by components/ui/toasts.tsx). A
 * toast says what happened; anything the person must act on stays on the page instead.
 */

/** An action went through: "Saved", "Removed Ana Moreno from the standby list". */
export function toastDone(message: string): void {
  toast.success(message);
}
