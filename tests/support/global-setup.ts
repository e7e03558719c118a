/** Integration tests drive the built app over HTTP; fail fast with a clear message if it isn't up. */
export default async function setup() {
  const base = process.env.TEST_APP_URL;
  if (!base || !process.env.DATABASE_URL) {
    throw new Error("Integration tests run inside `npm test`, which starts PostgreSQL, the fakes and the app. Run `npm test`.");
  }
  const res = await fetch(`${base}/api/health`).catch(() => null);
  if (!res?.ok) throw new Error(`The app isn't answering at ${base}. Run the tests with \`npm test\`.`);
}
