import { useSyncExternalStore } from 'react';

const key = 'upstroke.live.muted';
const listeners = new Set<() => void>();
let context: AudioContext | null = null;

/** Sound on or off for this device (cues and metronome), remembered across codes. */
export const muteStore = {
  get: () => localStorage.getItem(key) === '1',
  set(muted: boolean) {
    localStorage.setItem(key, muted ? '1' : '0');
    listeners.forEach((l) => l());
  },
  subscribe(l: () => void) {
    listeners.add(l);
    return () => {
      listeners.delete(l);
    };
  },
};

export function useMuted(): [boolean, (m: boolean) => void] {
  return [useSyncExternalStore(muteStore.subscribe, muteStore.get), muteStore.set];
}

/** A short sine tone with Web Audio; silent when muted or when audio is unavailable. */
export function beep(frequencyHz = 880, durationMs = 120, volume = 0.2): void {
  if (muteStore.get() || typeof AudioContext === 'undefined') return;
  try {
    context ??= new AudioContext();
    if (context.state === 'suspended') void context.resume();
    const osc = context.createOscillator();
    const gain = context.createGain();
    osc.frequency.value = frequencyHz;
    gain.gain.value = volume;
    osc.connect(gain).connect(context.destination);
    const t = context.currentTime;
    gain.gain.setTargetAtTime(0, t + durationMs / 1000, 0.01);
    osc.start(t);
    osc.stop(t + durationMs / 1000 + 0.05);
  } catch {
    // Audio is a convenience: the visual cue stays.
  }
}
