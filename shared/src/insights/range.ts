/** How many of the venue's days Insights counts when no range is asked for, today included. */
export const INSIGHTS_DEFAULT_DAYS = 30;
