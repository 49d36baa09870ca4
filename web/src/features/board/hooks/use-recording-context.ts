import type { SiteContext } from '@upstroke/contracts';
import { useLiveQuery } from 'dexie-react-hooks';
import { useState } from 'react';
import { offlineDb } from '../../../lib/offline';
import { useAuth } from '../../../hooks/use-auth';

const key = 'upstroke.lastSiteUnit';

interface Choice {
  siteId?: string;
  unitId?: string;
}

function readChoice(): Choice {
  try {
    return JSON.parse(localStorage.getItem(key) ?? '{}') as Choice;
  } catch {
    return {};
  }
}

/**
 * The user's sites (cached by the sync engine, so Start works offline) and this device's
 * last site and unit, remembered for the next one-tap start.
 */
export function useRecordingContext() {
  const { user } = useAuth();
  const cached = useLiveQuery(() => offlineDb.meta.get('context'), []);
  const sites: SiteContext[] = cached && 'sites' in cached.value ? cached.value.sites : [];
  const [choice, setChoiceState] = useState<Choice>(readChoice);
  const mine = user?.siteIds ?? [];
  const siteId = choice.siteId && mine.includes(choice.siteId) ? choice.siteId : mine[0];
  const site = sites.find((s) => s.id === siteId);
  const unitId =
    site && choice.unitId && !site.units.some((u) => u.id === choice.unitId)
      ? undefined
      : choice.unitId;
  const setChoice = (next: Choice) => {
    localStorage.setItem(key, JSON.stringify(next));
    setChoiceState(next);
  };
  return { sites, siteId, unitId, setChoice };
}
