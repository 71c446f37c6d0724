/** The standing caution for people who handle colour chemicals. */
export function StaffFooter() {
  return (
    <footer className="border-t border-ink/10 bg-white print:hidden">
      <p className="mx-auto max-w-7xl px-4 py-4 text-sm text-ink/80 sm:px-6">
        Colour and lightening products can burn skin and scalp and cause allergic reactions: follow the skin-test rule, wear gloves, keep the room ventilated,
        and follow your local regulations and licensed professional judgement. Dwell does not replace either.
      </p>
    </footer>
  );
}
