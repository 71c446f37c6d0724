import { DEMO_PASSWORD } from '../demo/demo-catalogue';

/** `paymentsPort`: where the local payments fake serves its hosted card page (test cards 4242…, 0002, 3155). */
export function printWelcome(url: string, paymentsPort?: number) {
  const payments = paymentsPort ? `\nThe test payment service's card pages open from Dwell's Pay buttons, on port ${paymentsPort}.\n` : '';
  console.log(`
Dwell is running at ${url}
${payments}
Demo sign-ins (password ${DEMO_PASSWORD}):
  owner        owner@demo.test
  front desk   desk@demo.test
  stylist      ana@demo.test   (also marcus@demo.test, lee@demo.test)
  client       client@demo.test

Press Ctrl-C to stop.`);
}
