/** API paths shared by the server routes and the client's api-client, so neither side spells them twice. */
export const apiPaths = {
  clients: '/api/clients',
  client: (id: string) => `/api/clients/${id}`,
  services: '/api/services',
  stylists: '/api/stylists',
  skinTests: (clientId: string) => `/api/clients/${clientId}/skin-tests`,
  clientAge: (clientId: string) => `/api/clients/${clientId}/age`,
  clientDateOfBirth: (clientId: string) => `/api/clients/${clientId}/date-of-birth`,
  guardianConsents: (clientId: string) => `/api/clients/${clientId}/guardian-consents`,
  myAge: '/api/me/age',
  myDateOfBirth: '/api/me/date-of-birth',
  skinTestClearances: (clientId: string) => `/api/clients/${clientId}/skin-test-clearances`,
  skinTestReading: (clientId: string, testId: string) => `/api/clients/${clientId}/skin-tests/${testId}/reading`,
} as const;
