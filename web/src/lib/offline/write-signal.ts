type Listener = () => void;
const listeners = new Set<Listener>();

/** Local writes announce themselves so that the sync engine can drain soon after a tap. */
export const writeSignal = {
  emit: () => listeners.forEach((l) => l()),
  subscribe(l: Listener) {
    listeners.add(l);
    return () => {
      listeners.delete(l);
    };
  },
};
