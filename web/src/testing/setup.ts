import '@testing-library/jest-dom/vitest';
import 'fake-indexeddb/auto';
import { cleanup, configure } from '@testing-library/react';
import { afterEach } from 'vitest';

// findBy…/waitFor give up after 1 s by default, which a loaded machine can exceed while the
// page is still on its way to the right state: wait up to 15 s (a failure still fails).
configure({ asyncUtilTimeout: 15_000 });

// Vitest runs without globals, so Testing Library's automatic clean-up must be registered here.
afterEach(() => cleanup());
