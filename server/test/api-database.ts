/** The empty database `npm test` provisions for these suites (never the one the running server uses). */
export function apiDatabaseUrl(): string {
  const url = process.env.DATABASE_URL_MANTLEPIECE_API;
  if (!url) throw new Error('DATABASE_URL_MANTLEPIECE_API is not set: run the suite through `node scripts/test.mjs server`');
  return url;
}
