// The owner's set-up paths as the tests call them, written out apart from the contracts (shared/api/setup.api.ts)
// so that a path changed there by mistake fails here.
export const setupPaths = {
  salon: '/api/owner/setup/salon',
  staff: '/api/owner/setup/staff',
  staffMember: (id: string) => `/api/owner/setup/staff/${id}`,
  staffTimeOff: (id: string) => `/api/owner/setup/staff/${id}/time-off`,
  staffTimeOffEntry: (id: string, entryId: string) => `/api/owner/setup/staff/${id}/time-off/${entryId}`,
  staffBookings: (id: string) => `/api/owner/setup/staff/${id}/future-bookings`,
  staffReassign: (id: string) => `/api/owner/setup/staff/${id}/reassign`,
  staffDeactivate: (id: string) => `/api/owner/setup/staff/${id}/deactivate`,
  units: '/api/owner/setup/units',
  unitsOf: (kind: 'chairs' | 'basins') => `/api/owner/setup/units/${kind}`,
  unit: (kind: 'chairs' | 'basins', id: string) => `/api/owner/setup/units/${kind}/${id}`,
  unitAffected: (kind: 'chairs' | 'basins', id: string, from: string, to: string) => `/api/owner/setup/units/${kind}/${id}/affected?from=${from}&to=${to}`,
  unitOutOfService: (kind: 'chairs' | 'basins', id: string) => `/api/owner/setup/units/${kind}/${id}/out-of-service`,
  services: '/api/owner/setup/services',
  service: (id: string) => `/api/owner/setup/services/${id}`,
  retailProducts: '/api/owner/retail-products',
  retailProduct: (id: string) => `/api/owner/retail-products/${id}`,
} as const;
