import type { Role } from '../api-types';

/** Editors and owners build coils; reviewers and viewers read them. */
export function canEditCoils(role: Role | null): boolean {
  return role === 'owner' || role === 'editor';
}
