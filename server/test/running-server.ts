/**
 * The server `npm test` started, on the database `seed` filled. A suite about it fails when the
 * address is missing rather than vanishing from the count.
 */
export function runningServerUrl(): string {
  const url = process.env.MANTLEPIECE_URL;
  if (!url) throw new Error('MANTLEPIECE_URL is not set: run this suite through `node scripts/test.mjs server`, which starts the server it checks');
  return url.replace(/\/$/, '');
}

export const demoPassword = process.env.DEMO_PASSWORD ?? 'mantlepiece-demo';
