/** What the engine answers (the JSON shapes of the contract). Times are ISO 8601 with offset. */
import type { StepKind } from './compile-request';

export interface OptionStep {
  kind: StepKind;
  /** The request step's own id and label, when it gave them. */
  id?: string;
  label?: string;
  start: string;
  end: string;
  basin?: string;
}

export interface OptionSitting {
  chair: string;
  steps: OptionStep[];
}

export interface Option {
  stylist: string;
  sittings: OptionSitting[];
}

export interface OptionsAnswer {
  options: Option[];
}

export interface HandsFreeWindow {
  stylist: string;
  start: string;
  end: string;
  /** Services (from `fits`) that fit somewhere inside the window. */
  fits: string[];
}

export interface WindowsAnswer {
  windows: HandsFreeWindow[];
}

export interface OccupancyAnswer {
  chairOccupancy: number | null;
  handsOnShare: Record<string, number | null>;
  windowUse: number | null;
}
