import { zodResolver } from '@hookform/resolvers/zod';
import { Alert, Box, Button, Paper, Stack, TextField, Typography } from '@mui/material';
import { type LoginRequest, loginRequestSchema } from '@upstroke/contracts';
import { useForm } from 'react-hook-form';
import { Navigate, useLocation } from 'react-router-dom';
import { ApiRequestError } from '../../../lib/api-client';
import { useLogin } from '../api/login';
import { useAuth } from '../../../hooks/use-auth';

function errorText(error: unknown): string {
  if (error instanceof ApiRequestError) {
    if (error.status === 429) return 'Too many attempts. Wait a minute, then try again.';
    return error.body?.message ?? 'Sign-in failed.';
  }
  return 'The server cannot be reached. Check the network and try again.';
}

export function SignInPage() {
  const { user } = useAuth();
  const location = useLocation();
  const login = useLogin();
  const { register, handleSubmit, formState } = useForm<LoginRequest>({
    resolver: zodResolver(loginRequestSchema),
    defaultValues: { email: '', password: '' },
  });
  const from = (location.state as { from?: string } | null)?.from ?? '/';
  if (user) return <Navigate to={from} replace />;

  return (
    <Box component="main" sx={{ minHeight: '100vh', display: 'grid', placeItems: 'center', p: 2 }}>
      <Paper sx={{ p: 4, width: '100%', maxWidth: 420 }} elevation={3}>
        <Stack
          component="form"
          spacing={2.5}
          noValidate
          onSubmit={handleSubmit((v) => login.mutate(v))}
        >
          <Box>
            <Typography variant="h1">Upstroke</Typography>
            <Typography color="text.secondary">Resuscitation record and EtCO2 debrief</Typography>
          </Box>
          {login.isError && <Alert severity="error">{errorText(login.error)}</Alert>}
          <TextField
            label="Email"
            type="email"
            autoComplete="username"
            autoFocus
            {...register('email')}
            error={Boolean(formState.errors.email)}
            helperText={formState.errors.email?.message}
          />
          <TextField
            label="Password"
            type="password"
            autoComplete="current-password"
            {...register('password')}
            error={Boolean(formState.errors.password)}
            helperText={formState.errors.password?.message}
          />
          <Button type="submit" variant="contained" size="large" disabled={login.isPending}>
            Sign in
          </Button>
        </Stack>
      </Paper>
    </Box>
  );
}
