/** Where the app under test runs (set by `npm test`). */
export const baseUrl = process.env.E2E_BASE_URL ?? 'http://localhost:8080';
export const databaseUrl =
  process.env.E2E_DATABASE_URL ?? 'postgres://postgres@127.0.0.1:54329/upstroke';
export const demoPassword = 'upstroke-demo';
export type DemoRole = 'recorder' | 'lead' | 'quality' | 'admin';
export const emailOf = (role: DemoRole) => `${role}@kestrel.test`;
