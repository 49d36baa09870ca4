import 'reflect-metadata';

process.env.NODE_ENV = 'test';
// Integration tests need the throwaway database that `npm test` starts (or TEST_DATABASE_URL).
process.env.DATABASE_URL =
  process.env.TEST_DATABASE_URL ??
  process.env.DATABASE_URL ??
  'postgres://postgres@127.0.0.1:54339/upstroke_test';
