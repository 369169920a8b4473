/** Every role a Driftmark user can hold. */
export const ROLES = ['owner', 'coach', 'assistant', 'athlete'] as const;
export type Role = (typeof ROLES)[number];

/** Roles that work with athletes (the coaching staff). */
export const STAFF_ROLES = ['owner', 'coach', 'assistant'] as const satisfies readonly Role[];
export type StaffRole = (typeof STAFF_ROLES)[number];

export function isStaffRole(role: Role): role is StaffRole {
  return (STAFF_ROLES as readonly Role[]).includes(role);
}

/** Roles that can be invited, and who may invite them. */
export const INVITABLE_ROLES = ['athlete', 'coach', 'assistant'] as const satisfies readonly Role[];
export type InvitableRole = (typeof INVITABLE_ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  owner: 'Head coach',
  coach: 'Coach',
  assistant: 'Assistant coach',
  athlete: 'Athlete',
};
