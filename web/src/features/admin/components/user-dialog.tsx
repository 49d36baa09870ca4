import { zodResolver } from '@hookform/resolvers/zod';
import {
  Alert,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  MenuItem,
  Stack,
  TextField,
} from '@mui/material';
import {
  type AdminUser,
  type InviteUser,
  inviteUserSchema,
  roleLabels,
  roleSchema,
  type Site,
} from '@upstroke/contracts';
import { useEffect, useState } from 'react';
import { Controller, useForm } from 'react-hook-form';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { useInviteUser } from '../api/invite-user';
import { useResetPassword } from '../api/reset-password';
import { useUpdateUser } from '../api/update-user';
import { apiErrorText } from './api-error';
import { SiteCheckboxes } from './site-checkboxes';

interface Props {
  user: AdminUser | null;
  sites: Site[];
  onClose: () => void;
  onDone: (message: string) => void;
}

/** Invite a new user (user = null) or change one: name, role, sites, state, password link. */
export function UserDialog({ user, sites, onClose, onDone }: Props) {
  const invite = useInviteUser();
  const update = useUpdateUser();
  const reset = useResetPassword();
  const onlySite = sites.length === 1 ? sites[0].id : null;
  const { register, control, handleSubmit, formState, setValue } = useForm<InviteUser>({
    resolver: zodResolver(inviteUserSchema),
    defaultValues: user
      ? { email: user.email, name: user.name, role: user.role, siteIds: user.siteIds }
      : { email: '', name: '', role: 'recorder', siteIds: onlySite ? [onlySite] : [] },
  });
  // The site list may arrive after the form opened (a slow network): the only site is then
  // ticked as it would have been, unless the admin has touched the sites already.
  const sitesTouched = Boolean(formState.dirtyFields.siteIds);
  useEffect(() => {
    if (!user && onlySite && !sitesTouched)
      setValue('siteIds', [onlySite], { shouldValidate: true });
  }, [user, onlySite, sitesTouched, setValue]);
  const [confirming, setConfirming] = useState(false);
  const failed = [invite, update, reset].find((m) => m.isError);
  const busy = invite.isPending || update.isPending || reset.isPending;
  const submit = handleSubmit((v) =>
    user
      ? update.mutate(
          { id: user.id, name: v.name, role: v.role, siteIds: v.siteIds },
          { onSuccess: () => onDone(`Saved ${v.name}.`) },
        )
      : invite.mutate(v, { onSuccess: () => onDone(`Invitation sent to ${v.email}.`) }),
  );
  const setActive = (active: boolean) =>
    user &&
    update.mutate(
      { id: user.id, active },
      { onSuccess: () => onDone(`${user.name} ${active ? 'reactivated' : 'deactivated'}.`) },
    );
  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="sm" aria-labelledby="user-dialog-title">
      <form noValidate onSubmit={(e) => void submit(e)}>
        <DialogTitle id="user-dialog-title">
          {user ? `Edit ${user.name}` : 'Invite user'}
        </DialogTitle>
        <DialogContent>
          <Stack spacing={2} sx={{ pt: 1 }}>
            {failed && <Alert severity="error">{apiErrorText(failed.error)}</Alert>}
            <TextField
              label="Email"
              type="email"
              disabled={Boolean(user)}
              {...register('email')}
              error={Boolean(formState.errors.email)}
              helperText={
                formState.errors.email?.message ??
                (user ? undefined : 'A one-time link to set a password is sent here')
              }
            />
            <TextField
              label="Name"
              {...register('name')}
              error={Boolean(formState.errors.name)}
              helperText={formState.errors.name?.message}
            />
            <Controller
              control={control}
              name="role"
              render={({ field }) => (
                <TextField select label="Role" {...field}>
                  {roleSchema.options.map((r) => (
                    <MenuItem key={r} value={r}>
                      {roleLabels[r]}
                    </MenuItem>
                  ))}
                </TextField>
              )}
            />
            <Controller
              control={control}
              name="siteIds"
              render={({ field, fieldState }) => (
                <SiteCheckboxes
                  sites={sites}
                  value={field.value}
                  onChange={field.onChange}
                  error={fieldState.error?.message}
                />
              )}
            />
          </Stack>
        </DialogContent>
        <DialogActions sx={{ flexWrap: 'wrap', gap: 1 }}>
          {user && user.active && (
            <>
              <Button
                color="warning"
                disabled={busy}
                onClick={() =>
                  reset.mutate(user.id, {
                    onSuccess: () => onDone(`A new password link was sent to ${user.email}.`),
                  })
                }
              >
                Send password reset link
              </Button>
              <Button color="error" disabled={busy} onClick={() => setConfirming(true)}>
                Deactivate
              </Button>
            </>
          )}
          {user && !user.active && (
            <Button disabled={busy} onClick={() => setActive(true)}>
              Reactivate
            </Button>
          )}
          <Button onClick={onClose}>Cancel</Button>
          <Button type="submit" variant="contained" disabled={busy}>
            {user ? 'Save' : 'Send invitation'}
          </Button>
        </DialogActions>
      </form>
      {confirming && user && (
        <ConfirmDialog
          title={`Deactivate ${user.name}?`}
          confirmLabel="Deactivate"
          danger
          busy={busy}
          onCancel={() => setConfirming(false)}
          onConfirm={() => {
            setConfirming(false);
            setActive(false);
          }}
        >
          {user.name} ({user.email}) is signed out on every device at once and can no longer sign
          in. Their records stay as they are. You can reactivate them later.
        </ConfirmDialog>
      )}
    </Dialog>
  );
}
