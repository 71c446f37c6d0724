/** The steps of booking online, in order; the progress list and the page agree on them. */
export const FLOW_STEPS = ['time', 'account', 'details', 'cautions', 'deposit'] as const;
export type FlowStep = (typeof FLOW_STEPS)[number];

export const flowStepNames: Record<FlowStep, string> = {
  time: 'Choose a time',
  account: 'Sign in',
  details: 'Your details',
  cautions: 'Before you pay',
  deposit: 'Deposit',
};

/** The steps this person goes through: someone already signed in has no "Sign in" step. */
export function flowStepsFor(signedIn: boolean): FlowStep[] {
  return FLOW_STEPS.filter((step) => !signedIn || step !== 'account');
}
