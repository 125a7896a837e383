import { z } from 'zod';

/** The four roles, as stored and sent over the API. */
export const roleValues = ['administrator', 'engineer', 'technician', 'reviewer'] as const;
export const roleSchema = z.enum(roleValues);
export type Role = z.infer<typeof roleSchema>;

/** How each role is named to people (our vocabulary, DESIGN.md). */
export const roleLabels: Record<Role, string> = {
  administrator: 'Administrator',
  engineer: 'Process engineer',
  technician: 'Line technician',
  reviewer: 'QA reviewer',
};
