/** An amount in the salon's currency for messages and policy texts, e.g. "$25.00". */
export const formatMoney = (cents: number, currency: string) => new Intl.NumberFormat('en-US', { style: 'currency', currency }).format(cents / 100);
