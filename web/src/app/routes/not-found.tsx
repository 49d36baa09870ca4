import { Button, Stack, Typography } from '@mui/material';
import { Link } from 'react-router-dom';

export function NotFoundPage() {
  return (
    <Stack spacing={2} sx={{ alignItems: 'flex-start', p: 3 }}>
      <Typography variant="h1">Page not found</Typography>
      <Typography color="text.secondary">There is nothing at this address.</Typography>
      <Button component={Link} to="/" variant="contained">
        Go to the Board
      </Button>
    </Stack>
  );
}

export function ForbiddenPage() {
  return (
    <Stack spacing={2} sx={{ alignItems: 'flex-start', p: 3 }}>
      <Typography variant="h1">Not available for your role</Typography>
      <Typography color="text.secondary">
        Ask an administrator if you need access to this screen.
      </Typography>
      <Button component={Link} to="/" variant="contained">
        Go back
      </Button>
    </Stack>
  );
}
