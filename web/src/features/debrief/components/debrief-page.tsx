import { Alert, Box, Card, CardContent, Chip, Stack, Typography } from '@mui/material';
import { resuscitationStatusLabels } from '@upstroke/contracts';
import { useMemo, useRef, useState } from 'react';
import { useParams } from 'react-router-dom';
import { ClinicalCaution } from '../../../components/ui/clinical-caution';
import { ErrorState, Loading, PageHeader } from '../../../components/ui/states';
import { formatterFor } from '../../../hooks/use-display-format';
import { useAuth } from '../../../hooks/use-auth';
import { useDebrief } from '../api/get-debrief';
import { ClosingPanel } from './closing-panel';
import { ExportActions } from './export-actions';
import { FindingsList } from './findings-list';
import { type ImportPanelSlot, ImportSlot } from './import-slot';
import { LeadNotes } from './lead-notes';
import { MeasureCards } from './measure-cards';
import { RefusedSection } from './refused-section';
import { TimelineSection } from './timeline-section';
import { type Band, timelineModel, viewAround } from './timeline-model';

function Section({ title, children }: { title: string; children: React.ReactNode }) {
  return (
    <Card variant="outlined">
      <CardContent>
        <Typography variant="h2" sx={{ fontSize: '1.25rem', mb: 1.5 }}>
          {title}
        </Typography>
        {children}
      </CardContent>
    </Card>
  );
}

/** Debrief: timeline, measures, findings, notes, closing details and signature, exports. */
export function DebriefPage({ importPanel }: { importPanel: ImportPanelSlot }) {
  const { id = '' } = useParams();
  const { hasRole } = useAuth();
  const query = useDebrief(id);
  const [selected, setSelected] = useState<number | null>(null);
  const [view, setView] = useState<Band | null>(null);
  const timelineRef = useRef<HTMLElement>(null);
  const model = useMemo(() => (query.data ? timelineModel(query.data) : null), [query.data]);
  if (query.isPending) return <Loading label="Loading the debrief…" />;
  if (query.isError) return <ErrorState error={query.error} onRetry={() => void query.refetch()} />;
  const d = query.data;
  const offline = d.computedBy === 'device';
  const lead = hasRole('lead');
  const finding = selected === null ? null : d.findings[selected];
  const select = (i: number) => {
    const f = d.findings[i];
    setSelected(i);
    if (model) setView(viewAround(f.startSec, f.endSec, model.durationSec));
    timelineRef.current?.scrollIntoView?.({ behavior: 'smooth', block: 'start' });
  };
  const fmt = formatterFor(d.record.display);
  const title = `Debrief — ${fmt.dateTime(d.record.arrestAt)}`;
  return (
    <Stack spacing={2}>
      <PageHeader title={title} actions={<ExportActions id={id} offline={offline} />} />
      <Stack direction="row" spacing={1} sx={{ flexWrap: 'wrap', gap: 1 }}>
        <Chip label={resuscitationStatusLabels[d.record.status]} />
        {d.record.unitName && <Chip variant="outlined" label={d.record.unitName} />}
        {d.record.location && d.record.location !== d.record.unitName && (
          <Chip variant="outlined" label={d.record.location} />
        )}
        <Chip
          variant="outlined"
          label={d.profile.version ? `${d.profile.name} v${d.profile.version}` : d.profile.name}
        />
      </Stack>
      {offline && (
        <Alert severity="info">
          Offline: analysed on this tablet from its own store. Signing, exports and e-mail wait for
          the network.
        </Alert>
      )}
      <RefusedSection resuscitationId={id} />
      <ClinicalCaution />
      {model && (
        <TimelineSection
          ref={timelineRef}
          debrief={d}
          model={model}
          fmt={fmt}
          view={view}
          finding={finding}
          onResetView={() => {
            setView(null);
            setSelected(null);
          }}
        />
      )}
      <Section title="Measures">
        <MeasureCards measures={d.measures} unit={d.record.etco2Unit} />
      </Section>
      <Section title={`Findings (${d.findings.length})`}>
        <FindingsList
          findings={d.findings}
          selected={selected}
          onSelect={select}
          ageGroup={d.record.ageGroup}
        />
      </Section>
      <Section title="Lead notes">
        <LeadNotes
          key={`${d.record.notesWentWell}|${d.record.notesToChange}|${d.record.status}`}
          record={d.record}
          canEdit={lead && !offline}
        />
      </Section>
      <Section title="Closing details and signature">
        <ClosingPanel
          key={`${d.record.status}|${d.record.outcome}`}
          record={d.record}
          events={d.events}
          canSign={lead && !offline}
        />
        {d.amendments.length > 0 && (
          <Box sx={{ mt: 2 }} component="section" aria-label="Amendments">
            <Typography variant="subtitle1">Amendments</Typography>
            {d.amendments.map((a) => (
              <Typography key={a.id} variant="body2" sx={{ mt: 0.5 }}>
                {fmt.dateTime(a.createdAt)} — {a.createdByName ?? a.createdBy}: {a.reason}
              </Typography>
            ))}
          </Box>
        )}
      </Section>
      {hasRole('lead', 'recorder') && !offline && d.record.status !== 'signed' && (
        <ImportSlot resuscitationId={id} panel={importPanel} />
      )}
    </Stack>
  );
}
