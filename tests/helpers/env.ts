// Tests that need the running stack read its coordinates from the environment
// that scripts/test.sh exports. Outside `npm test` they must fail loudly, not
// skip silently: a skipped integration test reads as a passed one.
export function requireEnv(name: string): string {
  const value = process.env[name];
  if (value === undefined || value.trim() === "") {
    throw new Error(
      `${name} is not set. Run the suite with \`npm test\`, which starts PostgreSQL, ` +
        `the SMTP fake and the app and exports ${name}.`,
    );
  }
  return value;
}
