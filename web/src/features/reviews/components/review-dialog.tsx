import { zodResolver } from '@hookform/resolvers/zod';
import {
  Alert,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  FormControlLabel,
  List,
  ListItem,
  ListItemText,
  Radio,
  RadioGroup,
  TextField,
  Typography,
} from '@mui/material';
import {
  type ReviewInput,
  reviewInputSchema,
  type ReviewQueueItem,
  reviewStatusLabels,
  reviewStatusSchema,
} from '@upstroke/contracts';
import type { z } from 'zod';
import { Controller, useForm } from 'react-hook-form';
import { useReviewHistory } from '../api/get-review-history';
import { useSaveReview } from '../api/save-review';
import { useDisplayFormat } from '../../../hooks/use-display-format';
import { RecordSummary } from './record-summary';

interface Props {
  item: ReviewQueueItem;
  onClose: () => void;
}

/**
 * The record's measures and findings (with a link to its Debrief), then its review status
 * with a comment; earlier entries stay listed below.
 */
export function ReviewDialog({ item, onClose }: Props) {
  const history = useReviewHistory(item.resuscitationId);
  const save = useSaveReview(item.resuscitationId);
  const { dateTime } = useDisplayFormat(item.siteId);
  const form = useForm<z.input<typeof reviewInputSchema>, unknown, ReviewInput>({
    resolver: zodResolver(reviewInputSchema),
    defaultValues: { status: 'reviewed', comment: '' },
  });
  const submit = form.handleSubmit((input) =>
    save.mutateAsync(input).then(onClose, () => undefined),
  );
  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="md" aria-labelledby="review-title">
      <form onSubmit={(e) => void submit(e)} noValidate>
        <DialogTitle id="review-title">
          Review of the arrest on {dateTime(item.arrestAt)}
        </DialogTitle>
        <DialogContent>
          <RecordSummary resuscitationId={item.resuscitationId} />
          {save.error ? <Alert severity="error">{save.error.message}</Alert> : null}
          <Controller
            name="status"
            control={form.control}
            render={({ field }) => (
              <RadioGroup {...field} aria-label="Review status" row>
                {reviewStatusSchema.options.map((v) => (
                  <FormControlLabel
                    key={v}
                    value={v}
                    control={<Radio />}
                    label={reviewStatusLabels[v]}
                  />
                ))}
              </RadioGroup>
            )}
          />
          <TextField
            {...form.register('comment')}
            label="Comment"
            multiline
            minRows={3}
            fullWidth
            margin="normal"
            error={Boolean(form.formState.errors.comment)}
            helperText={form.formState.errors.comment?.message}
          />
          <Typography variant="h3" component="h3" sx={{ mt: 2 }}>
            History
          </Typography>
          <List dense aria-label="Review history">
            {(history.data?.items ?? []).map((r) => (
              <ListItem key={r.id}>
                <ListItemText
                  primary={`${reviewStatusLabels[r.status]} — ${r.reviewerName}, ${dateTime(r.at)}`}
                  secondary={r.comment || 'No comment'}
                />
              </ListItem>
            ))}
            {history.data?.items.length === 0 ? (
              <ListItem>
                <ListItemText primary="Not reviewed yet" />
              </ListItem>
            ) : null}
          </List>
        </DialogContent>
        <DialogActions>
          <Button onClick={onClose}>Cancel</Button>
          <Button type="submit" variant="contained" disabled={save.isPending}>
            Save review
          </Button>
        </DialogActions>
      </form>
    </Dialog>
  );
}
