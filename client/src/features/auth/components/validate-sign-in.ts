export interface SignInValues {
  email: string;
  password: string;
}

export type SignInProblems = Partial<Record<keyof SignInValues, string>>;

// Deliberately loose: the server decides who exists; this only catches typing slips.
export const emailShape = /^[^\s@]+@[^\s@]+\.[^\s@]+$/;

export function validateSignIn({ email, password }: SignInValues): SignInProblems {
  const problems: SignInProblems = {};
  const trimmed = email.trim();
  if (trimmed === '') problems.email = 'Enter your e-mail address.';
  else if (!emailShape.test(trimmed)) problems.email = 'Enter an e-mail address like name@example.org.';
  if (password === '') problems.password = 'Enter your password.';
  return problems;
}
