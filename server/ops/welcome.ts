import { DEMO_PASSWORD } from '../demo/demo-catalogue';

export function printWelcome(url: string) {
  console.log(`
Dwell is running at ${url}

Demo sign-ins (password ${DEMO_PASSWORD}):
  owner        owner@demo.test
  front desk   desk@demo.test
  stylist      ana@demo.test   (also marcus@demo.test, lee@demo.test)
  client       client@demo.test

Press Ctrl-C to stop.`);
}
