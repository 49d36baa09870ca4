import type { ComponentType } from 'react';

let component: ComponentType | null = null;

/**
 * The top bar's status area (the sync indicator). Features register into it so that the
 * shell does not import feature code.
 */
export const statusSlot = {
  get: () => component,
  set: (c: ComponentType) => {
    component = c;
  },
};
