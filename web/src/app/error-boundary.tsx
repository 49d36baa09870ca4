import { Alert, Box, Button } from '@mui/material';
import { Component, type ErrorInfo, type ReactNode } from 'react';

interface State {
  error: Error | null;
}

/** Catches a crashing screen so that the rest of the app (and the offline store) survives. */
export class ErrorBoundary extends Component<{ children: ReactNode }, State> {
  override state: State = { error: null };

  static getDerivedStateFromError(error: Error): State {
    return { error };
  }

  override componentDidCatch(error: Error, info: ErrorInfo): void {
    console.error('Screen crashed', error, info.componentStack);
  }

  override render() {
    if (!this.state.error) return this.props.children;
    return (
      <Box sx={{ p: 3 }}>
        <Alert severity="error" action={<Button onClick={() => location.reload()}>Reload</Button>}>
          This screen hit an error: {this.state.error.message}. Everything already recorded is kept
          on this device.
        </Alert>
      </Box>
    );
  }
}
