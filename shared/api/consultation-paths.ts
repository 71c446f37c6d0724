// Paths of the consultation and quote routes; kept beside api-paths.ts so parallel work touches fewer shared lines.
export const consultationPaths = {
  propose: '/api/consultations/propose',
  create: '/api/consultations',
  one: (id: string) => `/api/consultations/${id}`,
  quote: (id: string) => `/api/consultations/${id}/quote`,
  sendQuote: (id: string) => `/api/consultations/${id}/quote/send`,
  ofClient: (clientId: string) => `/api/clients/${clientId}/consultations`,
  myQuotes: '/api/me/quotes',
  acceptMyQuote: (quoteId: string) => `/api/me/quotes/${quoteId}/accept`,
} as const;
