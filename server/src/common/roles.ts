export const ROLES = ['crew', 'driver', 'supervisor', 'admin'] as const;
export type Role = (typeof ROLES)[number];

/** Rank used for "at least" checks: an admin may do what a supervisor may. */
const RANK: Record<Role, number> = { crew: 0, driver: 1, supervisor: 2, admin: 3 };

export const roleAtLeast = (role: Role, min: Role) => RANK[role] >= RANK[min];
