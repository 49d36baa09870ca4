import { Button, Table, TableBody, TableCell, TableHead, TableRow } from '@mui/material';
import { type FunnelResponse, formatPercent } from '@upstroke/contracts';

type Point = FunnelResponse['points'][number];

/** Where a unit lies on the funnel, in words. */
function zoneWords(p: Point): string {
  const side = p.side === 'above' ? 'above' : 'below';
  switch (p.zone) {
    case 'within':
      return 'Within the 95 % limits';
    case 'beyond-95':
      return `Beyond the 95 % limits (${side}), within 99.8 %`;
    case 'beyond-99.8':
      return `Beyond the 99.8 % limits (${side})`;
    case 'no-data':
      return 'No records';
  }
}

/** Every unit (or site) with its n, share and place on the funnel; each opens its records. */
export function FunnelTable({
  funnel,
  onPoint,
}: {
  funnel: FunnelResponse;
  onPoint: (index: number) => void;
}) {
  const what = funnel.by === 'unit' ? 'Unit' : 'Site';
  return (
    <Table size="small" aria-label={`${what}s on the funnel plot`}>
      <TableHead>
        <TableRow>
          <TableCell>{what}</TableCell>
          <TableCell>n</TableCell>
          <TableCell>Met</TableCell>
          <TableCell>Share</TableCell>
          <TableCell>Where it lies</TableCell>
          <TableCell>Records</TableCell>
        </TableRow>
      </TableHead>
      <TableBody>
        {funnel.points.map((p, i) => (
          <TableRow key={p.id ?? 'none'}>
            <TableCell>
              {p.name}
              {funnel.by === 'unit' && p.siteName ? ` (${p.siteName})` : ''}
            </TableCell>
            <TableCell>{p.n}</TableCell>
            <TableCell>{p.x}</TableCell>
            <TableCell>{formatPercent(p.p, 1)}</TableCell>
            <TableCell>{zoneWords(p)}</TableCell>
            <TableCell>
              <Button
                size="small"
                disabled={p.n === 0 || p.records === null}
                onClick={() => onPoint(i)}
                aria-label={`Records of ${p.name}`}
              >
                Open
              </Button>
            </TableCell>
          </TableRow>
        ))}
      </TableBody>
    </Table>
  );
}
