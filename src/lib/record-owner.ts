/** Whose record a page shows: the signed-in client's own ('me') or one client's, for the salon's team. */
export type RecordOwner = 'me' | { clientId: string };

/** The query-key part for an owner. */
export const ownerKey = (owner: RecordOwner) => (owner === 'me' ? 'me' : owner.clientId);

/** Picks the `/api/me/…` path or the `/api/clients/:id/…` one. */
export const ownerPath = (owner: RecordOwner, paths: { mine: string; ofClient: (clientId: string) => string }) =>
  owner === 'me' ? paths.mine : paths.ofClient(owner.clientId);
