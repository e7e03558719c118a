/**
 * A routine visit counts as overdue when it has no signed-off report a day after its start: the
 * crew has the rest of the day to write it up (common practice), after that the lead should look.
 */
export const OVERDUE_GRACE_HOURS = 24;
