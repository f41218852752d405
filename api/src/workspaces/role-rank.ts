import type { Role } from './workspaces-dto';

const rank: Record<Role, number> = { owner: 4, editor: 3, reviewer: 2, viewer: 1 };

/** True when `role` grants at least what `required` grants. */
export function roleAtLeast(role: Role, required: Role): boolean {
  return rank[role] >= rank[required];
}
