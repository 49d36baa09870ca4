import { type TaskMessage, tasks } from './work-pool.tasks';

/** Worker thread entry (piscina): runs one named task with its arguments. */
export default function run(message: TaskMessage): unknown {
  const task = tasks[message.name] as (...args: unknown[]) => unknown;
  return task(...message.args);
}
