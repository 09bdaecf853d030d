/** Club roles, least to most trusted; each role may do everything the ones before it may. */
export const ROLES = ['crew', 'driver', 'supervisor', 'admin'] as const;
export type Role = (typeof ROLES)[number];

export function isRole(value: unknown): value is Role {
  return typeof value === 'string' && (ROLES as readonly string[]).includes(value);
}

export function roleAtLeast(role: Role, min: Role): boolean {
  return ROLES.indexOf(role) >= ROLES.indexOf(min);
}

const ROLE_PHRASE: Record<Role, string> = {
  crew: 'any member',
  driver: 'a driver, supervisor or admin',
  supervisor: 'a supervisor or admin',
  admin: 'an admin',
};

/** "a supervisor or admin": who holds at least `min`, for messages. */
export function whoMay(min: Role): string {
  return ROLE_PHRASE[min];
}
