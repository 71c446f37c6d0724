import type { ExpressionBuilder } from 'kysely';
import type { Database } from '@server/db/schema';

/**
 * The payments rows that moved money, for anything that adds money up (takings, utilisation): payments taken, and
 * refunds made or on their way (a pending refund is decided). A declined or failed row moved nothing.
 */
export const moneyMoved = (eb: ExpressionBuilder<Database & { p: Database['payments'] }, 'p'>) =>
  eb.or([eb('p.status', '=', 'succeeded'), eb.and([eb('p.kind', '=', 'refund'), eb('p.status', '=', 'pending')])]);
