/**
 * Who may do what in the casebook, apart from the casebook's schemas: the run log and the
 * server's permission table ask it, and importing it must not build the casebook's hundreds of
 * zod schemas on a screen that shows none of them.
 */
import { ROLES, type Role } from "./auth.ts";

/** Who may do what in the casebook (issue 5 role rules: everyone reads and practises; seniors and owners author). */
export const CASEBOOK_PERMISSIONS = {
  author: ["owner", "senior"],
  attempt: ROLES,
  seeTeamProgress: ["owner", "senior"],
} as const satisfies Record<string, readonly Role[]>;

export function canCasebook(role: Role, permission: keyof typeof CASEBOOK_PERMISSIONS): boolean {
  return (CASEBOOK_PERMISSIONS[permission] as readonly Role[]).includes(role);
}
