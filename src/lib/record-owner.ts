/** Whose record a page shows: the signed-in client's own ('me') or one client's, for the salon's team. */
export type RecordOwner = 'me' | { clientId: string };
