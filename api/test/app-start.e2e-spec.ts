import { Logger } from '@nestjs/common';
import { startTestApp } from './test-app';

/** The app starts without warnings from Nest about its own configuration. */
describe('app start', () => {
  it('uses the current route path syntax (no "Unsupported route path" at start)', async () => {
    const said: string[] = [];
    const keep = (...args: unknown[]) => void said.push(args.map(String).join(' '));
    const warn = jest.spyOn(Logger.prototype, 'warn').mockImplementation(keep);
    const error = jest.spyOn(Logger.prototype, 'error').mockImplementation(keep);
    const t = await startTestApp();
    try {
      expect((await t.http().get('/api/health')).status).toBe(200);
      expect(said.filter((s) => /route path/i.test(s))).toEqual([]);
    } finally {
      warn.mockRestore();
      error.mockRestore();
      await t.close();
    }
  });
});
