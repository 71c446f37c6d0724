// The planning feature's public module: other features import it only from here.
export {
  exactPlan,
  freeStylists,
  horizonFor,
  localEarliest,
  occupancyOver,
  occupancyScenario,
  optionsFor,
  planningSalon,
  toBookingOption,
  windowsOn,
  type PlacedOption,
  type PlacedSitting,
  type PlanningSalon,
  type StartLimit,
  type TakeOverAsk,
} from './planning-port';
export { assertWithinProcessingLimits } from './processing-limits-check';
export { lockStylists } from './stylist-lock.repository';
export { replanDayFor, replanDaysUnderWay, type ReplanSalon } from './replan-port';
export { bookableSteps, type OfferedFix, type ReplanConflict, type ReplannedSitting, type ReplannedStep, type StylistReplan } from './replan-ask';
