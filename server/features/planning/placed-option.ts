import type { Option, OptionStep } from '@shared/engine/engine';

/** A step as the engine placed it, with the id and label the request gave it (carried through the engine). */
export interface PlacedStep {
  id: string;
  label: string;
  kind: OptionStep['kind'];
  start: string;
  end: string;
  basin: string | null;
}

export interface PlacedSitting {
  chair: string;
  steps: PlacedStep[];
}

export interface PlacedOption {
  stylist: string;
  sittings: PlacedSitting[];
}

/** The engine's answer in the port's shape. Every request the port sends tags its steps, so each tag is there. */
export function placedOption(option: Option): PlacedOption {
  return {
    stylist: option.stylist,
    sittings: option.sittings.map((s) => ({
      chair: s.chair,
      steps: s.steps.map((st) => ({ id: st.id!, label: st.label!, kind: st.kind, start: st.start, end: st.end, basin: st.basin ?? null })),
    })),
  };
}
