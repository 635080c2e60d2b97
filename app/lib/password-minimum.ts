/**
 * The fewest characters a password has. Its own module, without Zod, so a page that
 * names it in a hint does not load the account schemas (account-schemas.ts) with its
 * first-load JavaScript.
 */
export const passwordMinimum = 10;
