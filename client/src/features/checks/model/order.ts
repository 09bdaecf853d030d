/** Newest first by when the check was started. */
export const newestFirst = (a: { fields: { startedAt: string } }, b: { fields: { startedAt: string } }) =>
  b.fields.startedAt.localeCompare(a.fields.startedAt);
