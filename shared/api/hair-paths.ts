// Paths of the hair-history and photo routes; kept beside api-paths.ts so the online booking work can
// edit that file without colliding with this one. Merge them when both land.
export const photoPaths = {
  mine: '/api/me/photos',
  ofClient: (clientId: string) => `/api/clients/${clientId}/photos`,
  one: (id: string) => `/api/photos/${id}`,
} as const;

export const hairHistoryPaths = {
  mine: '/api/me/hair-history',
  ofClient: (clientId: string) => `/api/clients/${clientId}/hair-history`,
} as const;
