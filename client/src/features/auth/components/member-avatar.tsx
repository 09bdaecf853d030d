import Avatar from '@mui/material/Avatar';

export function initials(name: string): string {
  const parts = name.trim().split(/\s+/).filter(Boolean);
  return (parts.length > 1 ? parts[0]![0]! + parts[parts.length - 1]![0]! : (parts[0] ?? '?').slice(0, 2)).toUpperCase();
}

/** A member's initials in a circle; the name itself is always written beside it. */
export function MemberAvatar({ name, size = 40 }: { name: string; size?: number }) {
  return (
    <Avatar aria-hidden sx={{ width: size, height: size, bgcolor: 'primary.main', fontSize: size * 0.4 }}>
      {initials(name)}
    </Avatar>
  );
}
