import { testEnv } from './test-env';

// Fails fast, with a clear message, when the suites are started without the throwaway cluster.
export default function setup() {
  testEnv();
}
