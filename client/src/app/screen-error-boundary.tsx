import { Component, type ReactNode } from 'react';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Typography from '@mui/material/Typography';

interface Props {
  /** A change (the address) clears a failure, so going elsewhere gets a working screen back. */
  resetKey: string;
  children: ReactNode;
}

interface State {
  error: Error | null;
  resetKey: string;
}

/**
 * Shows a screen that failed to draw, or whose code did not load, as a message with a way out
 * rather than an empty page. Records are in IndexedDB and the outbox, so nothing saved is lost.
 */
export class ScreenErrorBoundary extends Component<Props, State> {
  state: State = { error: null, resetKey: this.props.resetKey };

  static getDerivedStateFromError(error: unknown): Partial<State> {
    return { error: error instanceof Error ? error : new Error(String(error)) };
  }

  static getDerivedStateFromProps(props: Props, state: State): Partial<State> | null {
    return props.resetKey === state.resetKey ? null : { error: null, resetKey: props.resetKey };
  }

  render() {
    const { error } = this.state;
    if (!error) return this.props.children;
    return (
      <Box component="main" role="alert" sx={{ p: 3, maxWidth: 560, mx: 'auto' }}>
        <Typography variant="h5" component="h1" gutterBottom>
          This screen could not be shown
        </Typography>
        <Typography sx={{ mb: 1 }}>{error.message}</Typography>
        <Typography sx={{ color: 'text.secondary', mb: 2 }}>
          What this phone has saved is kept. Reload to try again.
        </Typography>
        <Button variant="contained" onClick={() => window.location.reload()}>
          Reload
        </Button>
      </Box>
    );
  }
}
