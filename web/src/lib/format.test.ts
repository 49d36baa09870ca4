import { describe, expect, it } from 'vitest';
import { formatDuration } from './format';

describe('format', () => {
  it('shows durations as m:ss and h:mm:ss', () => {
    expect(formatDuration(0)).toBe('0:00');
    expect(formatDuration(125)).toBe('2:05');
    expect(formatDuration(3725)).toBe('1:02:05');
    expect(formatDuration(null)).toBe('—');
  });
});
