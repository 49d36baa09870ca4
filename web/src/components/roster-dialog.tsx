import { memo } from 'react';
import { zodResolver } from '@hookform/resolvers/zod';
import Delete from '@mui/icons-material/Delete';
import {
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  IconButton,
  MenuItem,
  Stack,
  TextField,
} from '@mui/material';
import {
  type RosterMember,
  rosterMemberSchema,
  rosterRoleLabels,
  rosterRoleSchema,
} from '@upstroke/contracts';
import { useFieldArray, useForm } from 'react-hook-form';
import { z } from 'zod';
import { updateResuscitation } from '../lib/offline';

const roles = rosterRoleSchema.options.map((value) => ({ value, label: rosterRoleLabels[value] }));

// The form keeps an empty e-mail as '' and sends it as absent.
const formSchema = z.object({
  members: z.array(
    rosterMemberSchema.extend({ email: z.union([z.literal(''), z.email()]).optional() }),
  ),
});
type Form = z.infer<typeof formSchema>;

/** Who is present and in which role; saved to the record (and the debrief e-mail list). */
export const RosterDialog = memo(function RosterDialog(props: {
  open: boolean;
  recordId: string;
  roster: RosterMember[];
  onClose: () => void;
}) {
  const { control, register, handleSubmit, formState } = useForm<Form>({
    resolver: zodResolver(formSchema),
    values: { members: props.roster.map((m) => ({ ...m, email: m.email ?? '' })) },
  });
  const { fields, append, remove } = useFieldArray({ control, name: 'members' });
  const save = handleSubmit(async ({ members }) => {
    const roster = members.map(({ email, ...m }) => (email ? { ...m, email } : m));
    await updateResuscitation(props.recordId, { roster });
    props.onClose();
  });
  return (
    <Dialog
      open={props.open}
      onClose={props.onClose}
      fullWidth
      maxWidth="md"
      aria-labelledby="roster-title"
    >
      <DialogTitle id="roster-title">Team</DialogTitle>
      <DialogContent>
        <Stack spacing={1.5} sx={{ mt: 1 }}>
          {fields.map((f, i) => (
            <Stack key={f.id} direction={{ xs: 'column', sm: 'row' }} spacing={1}>
              <TextField
                label="Name"
                {...register(`members.${i}.name`)}
                error={!!formState.errors.members?.[i]?.name}
                helperText={formState.errors.members?.[i]?.name?.message}
              />
              <TextField
                select
                label="Role"
                defaultValue={f.role}
                {...register(`members.${i}.role`)}
                sx={{ minWidth: 160 }}
              >
                {roles.map((r) => (
                  <MenuItem key={r.value} value={r.value}>
                    {r.label}
                  </MenuItem>
                ))}
              </TextField>
              <TextField
                label="E-mail (optional)"
                type="email"
                {...register(`members.${i}.email`)}
                error={!!formState.errors.members?.[i]?.email}
                helperText={formState.errors.members?.[i]?.email?.message}
              />
              <IconButton aria-label={`Remove team member ${i + 1}`} onClick={() => remove(i)}>
                <Delete />
              </IconButton>
            </Stack>
          ))}
          <Button
            onClick={() => append({ name: '', role: 'compressor', email: '' })}
            sx={{ alignSelf: 'flex-start' }}
          >
            Add team member
          </Button>
        </Stack>
      </DialogContent>
      <DialogActions>
        <Button onClick={props.onClose}>Cancel</Button>
        <Button variant="contained" onClick={() => void save()}>
          Save team
        </Button>
      </DialogActions>
    </Dialog>
  );
});
