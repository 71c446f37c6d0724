/** The key to the grey the calendars draw where the salon is closed (the `salon-closed` look). */
export function ClosedKey() {
  return (
    <p className="flex items-center gap-2 text-sm">
      <span aria-hidden="true" className="salon-closed inline-block h-4 w-6 rounded ring-1 ring-ink/20" /> Grey: the salon is closed
    </p>
  );
}
