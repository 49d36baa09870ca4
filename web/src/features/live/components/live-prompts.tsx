import type { Etco2DisplayUnit, Thresholds } from '@upstroke/contracts';
import { memo } from 'react';
import type { LocalEtco2, LocalEvent } from '../../../lib/offline';
import { useNow } from '../hooks/use-now';
import { usePrompts } from '../hooks/use-prompts';
import type { LiveState } from '../lib/live-state';
import { PromptBanner } from './prompt-banner';

/** The prompt banner, recomputed once a second from the recorded data. */
export const LivePrompts = memo(function LivePrompts(props: {
  arrestAt: string;
  state: LiveState;
  events: LocalEvent[];
  etco2: LocalEtco2[];
  thresholds: Thresholds;
  unit: Etco2DisplayUnit;
}) {
  const now = useNow(1000);
  const prompts = usePrompts({ ...props, now });
  return <PromptBanner prompts={prompts} />;
});
