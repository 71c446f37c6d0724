/** Connection strings the `npm test` runner passes in; running Vitest by hand needs them too. */
export function testEnv() {
  const templateUrl = process.env.DWELL_TEST_TEMPLATE_URL;
  const adminUrl = process.env.DWELL_TEST_ADMIN_URL;
  if (!templateUrl || !adminUrl) {
    throw new Error('Run the database suites through `npm test` (it starts a throwaway PostgreSQL cluster).');
  }
  return { templateUrl, adminUrl, chromium: process.env.DWELL_CHROMIUM ?? '/usr/bin/chromium' };
}
