/** Every route of the app: its pattern for the router and a builder for links. */
export const paths = {
  today: { path: '/', href: () => '/' },
  checks: { path: '/checks', href: () => '/checks' },
  trips: { path: '/trips', href: () => '/trips' },
  defects: { path: '/defects', href: () => '/defects' },
  more: { path: '/more', href: () => '/more' },
  signIn: {
    path: '/sign-in',
    /** `next`: where to go after signing in (an in-app path). */
    href: (next?: string) => (next && next !== '/' ? `/sign-in?next=${encodeURIComponent(next)}` : '/sign-in'),
  },
  reviewDesk: { path: '/review', href: () => '/review' },
  admin: { path: '/admin', href: () => '/admin' },
} as const;

export type RouteName = keyof typeof paths;

/** Only in-app paths are followed after sign-in, so a link cannot send someone off-site. */
export function safeNextPath(next: string | null): string {
  return next && next.startsWith('/') && !next.startsWith('//') && !next.startsWith('/\\') ? next : paths.today.href();
}
