import { lazy, Suspense, useState, type ComponentProps } from 'react';
import IconButton from '@mui/material/IconButton';
import { MemberAvatar } from '@/features/auth/components/member-avatar';
import { useSession } from '@/features/auth/use-auth';

// The menu (and MUI's popover under it) is not needed to show Today, so it loads on first use,
// with the query cache its sign-out and club switch use.
const loadPopup = () => Promise.all([import('./account-menu-popup'), import('../with-queries')]);
const AccountMenuPopup = lazy(async () => {
  const [{ default: Popup }, { WithQueries }] = await loadPopup();
  return {
    default: (props: ComponentProps<typeof Popup>) => (
      <WithQueries>
        <Popup {...props} />
      </WithQueries>
    ),
  };
});

export function AccountMenu() {
  const { user } = useSession();
  const [anchor, setAnchor] = useState<HTMLElement | null>(null);
  const [opened, setOpened] = useState(false);
  return (
    <>
      <IconButton
        color="inherit"
        aria-label={`Account: ${user.displayName}`}
        aria-haspopup="menu"
        onPointerDown={() => void loadPopup()}
        onClick={(e) => {
          setAnchor(e.currentTarget);
          setOpened(true);
        }}
      >
        <MemberAvatar name={user.displayName} size={36} />
      </IconButton>
      {opened && (
        <Suspense fallback={null}>
          <AccountMenuPopup anchor={anchor} onClose={() => setAnchor(null)} />
        </Suspense>
      )}
    </>
  );
}
