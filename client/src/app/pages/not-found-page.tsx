import Button from '@mui/material/Button';
import { Link as RouterLink } from 'react-router-dom';
import { EmptyState } from '@/components/empty-state';
import { paths } from '../paths';

export function NotFoundPage() {
  return (
    <>
      <EmptyState title="There is no page at this address">
        The link may be old or mistyped.
      </EmptyState>
      <Button component={RouterLink} to={paths.today.href()} variant="contained" sx={{ mt: 2 }}>
        Go to Today
      </Button>
    </>
  );
}
