export const MIN_PASSWORD_LENGTH = 10;

export interface NewPasswordValues {
  password: string;
  repeat: string;
}

/** Problems with a new password, worded as what to do; an empty object when it will do. */
export function newPasswordProblems({ password, repeat }: NewPasswordValues): Partial<Record<keyof NewPasswordValues, string>> {
  const problems: Partial<Record<keyof NewPasswordValues, string>> = {};
  if (password.length < MIN_PASSWORD_LENGTH) {
    problems.password = `Use at least ${MIN_PASSWORD_LENGTH} characters; a few words you will remember work well.`;
  }
  if (repeat !== password) problems.repeat = 'The two passwords differ: type the same password in both boxes.';
  return problems;
}
