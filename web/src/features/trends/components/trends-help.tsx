import { formatEtco2Both } from '@upstroke/contracts';
import { Accordion, AccordionDetails, AccordionSummary, Typography } from '@mui/material';

/** How every figure on the page is computed (the definitions the tests check). */
export function TrendsHelp() {
  return (
    <Accordion disableGutters sx={{ mb: 2 }} className="no-print">
      <AccordionSummary aria-controls="trends-help" id="trends-help-title">
        <Typography variant="h3" component="h2">
          How these figures are computed
        </Typography>
      </AccordionSummary>
      <AccordionDetails id="trends-help">
        <Typography component="ul" sx={{ pl: 2, m: 0 }}>
          <li>
            Months are calendar months in UTC; each point counts signed records whose arrest falls
            in that month. n is the number of records the point is computed from.
          </li>
          <li>
            Median: the middle value of the records with a value (the mean of the two middle values
            when n is even). Records without the value are left out of n.
          </li>
          <li>
            Percentages of records (EtCO2 documented, any ROSC, sustained ROSC): records with it ÷
            all records in the month.
          </li>
          <li>
            Compression fraction: compression time ÷ time without circulation (arrest to first ROSC
            or end).
          </li>
          <li>
            % of CPR time with EtCO2 ≥ {formatEtco2Both(10)}: per record, then the median across
            records.
          </li>
          <li>
            Time to first shock: records with a shockable first rhythm (VF, pVT). Time to first
            epinephrine: non-shockable first rhythm.
          </li>
          <li>
            Long pre-shock pauses per record: pre-shock pauses over the profile limit ÷ records with
            at least one shock.
          </li>
          <li>
            Sustained ROSC: ROSC lasting ≥ 20 min without compressions, or attested by the lead.
          </li>
          <li>
            Target lines come from the site&apos;s protocol profile; none is drawn when the sites in
            view differ.
          </li>
        </Typography>
        <Typography color="text.secondary" sx={{ mt: 1 }}>
          These are audit measures for review. Follow your local resuscitation protocol and clinical
          judgement.
        </Typography>
      </AccordionDetails>
    </Accordion>
  );
}
