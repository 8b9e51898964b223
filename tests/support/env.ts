/** The running test server's address; set by scripts/test.mjs. */
export function testBaseUrl(): string {
  const url = process.env.IONFOLIO_TEST_BASE_URL
  if (!url) throw new Error('These tests need the services that `npm test` starts: run them through `npm test -- --project api`')
  return url
}
