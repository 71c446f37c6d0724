import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { HairHistory, HairHistoryResponse } from '@shared/schemas/hair-history.schemas';
import type { Db } from '@server/db/database';
import { clientIdFor, myClientId } from '@server/auth/client-access';
import { findHairHistory, saveHairHistory } from './hair-history.repository';

export async function myHairHistory(db: Db, user: SessionUser): Promise<HairHistoryResponse> {
  return findHairHistory(db, await myClientId(db, user));
}

export async function saveMyHairHistory(db: Db, user: SessionUser, answers: HairHistory): Promise<HairHistoryResponse> {
  return saveHairHistory(db, await myClientId(db, user), answers);
}

/** A client's hair history, for the client themselves or their salon's team. */
export async function clientHairHistory(db: Db, user: SessionUser, clientId: string): Promise<HairHistoryResponse> {
  return findHairHistory(db, await clientIdFor(db, user, clientId));
}

export async function saveClientHairHistory(db: Db, user: SessionUser, clientId: string, answers: HairHistory): Promise<HairHistoryResponse> {
  return saveHairHistory(db, await clientIdFor(db, user, clientId), answers);
}
