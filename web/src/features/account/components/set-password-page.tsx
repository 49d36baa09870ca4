import { zodResolver } from '@hookform/resolvers/zod';
import { Alert, Box, Button, Paper, Stack, TextField, Typography } from '@mui/material';
import { passwordSchema } from '@upstroke/contracts';
import { useForm } from 'react-hook-form';
import { Link as RouterLink, useSearchParams } from 'react-router-dom';
import { z } from 'zod';
import { ApiRequestError } from '../../../lib/api-client';
import { useSetPassword } from '../api/set-password';

const formSchema = z
  .object({ password: passwordSchema, repeat: z.string() })
  .refine((v) => v.password === v.repeat, { path: ['repeat'], error: 'The two passwords differ' });
type Form = z.infer<typeof formSchema>;

function errorText(error: unknown): string {
  if (error instanceof ApiRequestError)
    return error.body?.message ?? 'The password could not be set.';
  return 'The server cannot be reached. Check the network and try again.';
}

/** The page a one-time link opens: choose a password, then sign in with it. */
export function SetPasswordPage() {
  const [params] = useSearchParams();
  const token = params.get('token') ?? '';
  const mutation = useSetPassword();
  const { register, handleSubmit, formState } = useForm<Form>({
    resolver: zodResolver(formSchema),
    defaultValues: { password: '', repeat: '' },
  });
  const submit = handleSubmit(({ password }) => mutation.mutate({ token, password }));
  return (
    <Box component="main" sx={{ minHeight: '100vh', display: 'grid', placeItems: 'center', p: 2 }}>
      <Paper sx={{ p: 4, width: '100%', maxWidth: 460 }} elevation={3}>
        <Stack component="form" spacing={2.5} noValidate onSubmit={(e) => void submit(e)}>
          <Typography variant="h1">Set your password</Typography>
          {!token && (
            <Alert severity="error">
              This link is incomplete. Open the link from your e-mail again, or ask an admin for a
              new one.
            </Alert>
          )}
          {mutation.isError && <Alert severity="error">{errorText(mutation.error)}</Alert>}
          {mutation.isSuccess ? (
            <>
              <Alert severity="success">
                Your password is set. Sign in with {mutation.data.email}.
              </Alert>
              <Button component={RouterLink} to="/sign-in" variant="contained" size="large">
                Go to Sign in
              </Button>
            </>
          ) : (
            <>
              <Typography color="text.secondary">
                At least 10 characters, with a letter and a digit.
              </Typography>
              <TextField
                label="New password"
                type="password"
                autoComplete="new-password"
                autoFocus
                {...register('password')}
                error={Boolean(formState.errors.password)}
                helperText={formState.errors.password?.message}
              />
              <TextField
                label="Repeat password"
                type="password"
                autoComplete="new-password"
                {...register('repeat')}
                error={Boolean(formState.errors.repeat)}
                helperText={formState.errors.repeat?.message}
              />
              <Button
                type="submit"
                variant="contained"
                size="large"
                disabled={!token || mutation.isPending}
              >
                Set password
              </Button>
            </>
          )}
        </Stack>
      </Paper>
    </Box>
  );
}
