/** Vertical scale of the day timeline: pixels per minute (12 hours ≈ 1,100 px). */
export const PX_PER_MIN = 1.5;
/** Height of the stylist-name row above each column, matched by the hour axis. */
export const COLUMN_HEADER_CLASS = 'h-12';
