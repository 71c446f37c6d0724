// Paths of the hair-history routes (moving into hair-history.api.ts).
export const hairHistoryPaths = {
  mine: '/api/me/hair-history',
  ofClient: (clientId: string) => `/api/clients/${clientId}/hair-history`,
} as const;
