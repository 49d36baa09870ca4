// Reads test counts from the runners' machine-readable reports (vitest/jest JSON, node TAP).
import fs from 'node:fs';

export function countsOf(file) {
  if (!fs.existsSync(file)) return null;
  const text = fs.readFileSync(file, 'utf8');
  if (file.endsWith('.tap')) {
    const pass = /^# pass (\d+)/m.exec(text);
    const fail = /^# fail (\d+)/m.exec(text);
    return pass ? { passed: Number(pass[1]), failed: Number(fail?.[1] ?? 0) } : null;
  }
  try {
    const json = JSON.parse(text);
    return {
      passed: json.numPassedTests ?? 0,
      failed: (json.numFailedTests ?? 0) + (json.numRuntimeErrorTestSuites ?? 0),
    };
  } catch {
    return null;
  }
}
