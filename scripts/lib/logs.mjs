// Logs of services the test run starts: on failure the tail is printed and the file is kept
// under .local/logs/ (the run's own folder is removed afterwards).
import fs from 'node:fs';
import path from 'node:path';

export function tailOf(file, lines = 40) {
  if (!fs.existsSync(file)) return `(no log at ${file})`;
  const text = fs.readFileSync(file, 'utf8').trimEnd();
  return text ? text.split('\n').slice(-lines).join('\n') : '(the log is empty)';
}

/** Prints the last lines of `file` and copies it to `<root>/.local/logs/<name>`; returns that path. */
export function keepLog(root, file, name, what) {
  const dir = path.join(root, '.local', 'logs');
  fs.mkdirSync(dir, { recursive: true });
  const kept = path.join(dir, name);
  if (fs.existsSync(file)) fs.copyFileSync(file, kept);
  process.stderr.write(`\n── ${what}: last lines of its log\n${tailOf(file)}\n`);
  process.stderr.write(`── full log kept at ${path.relative(root, kept)}\n\n`);
  return kept;
}
