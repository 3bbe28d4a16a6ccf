// The shapes of users as the API sends them and the forms that change them (used by the client's forms too).
import { z } from 'zod';
import { roles, type Role } from '../auth/roles.js';

export type DisplayUnit = 'F' | 'C';

/** The signed-in user as the client sees them. */
export interface SessionUser {
  id: number;
  email: string;
  name: string;
  roles: Role[];
  allSites: boolean;
  siteIds: number[];
  displayUnit: DisplayUnit;
}

export interface UserSummary extends SessionUser {
  active: boolean;
  createdAt: string;
}

const email = z.string().trim().toLowerCase().max(254, 'At most 254 characters.').email('Enter an e-mail address.');
const name = z.string().trim().min(1, 'Enter a name.').max(120, 'At most 120 characters.');
const roleList = z.array(z.enum(roles)).min(1, 'Choose at least one role.').max(roles.length);
const siteIds = z.array(z.number().int().positive()).max(500);

export const signInSchema = z.object({
  email: z.string().trim().toLowerCase().min(1, 'Enter your e-mail.').max(254),
  // The length cap here only stops abuse; the password policy applies when a password is set.
  password: z.string().min(1, 'Enter your password.').max(1024),
});

export const createUserSchema = z.object({
  email,
  name,
  roles: roleList,
  allSites: z.boolean().default(true),
  siteIds: siteIds.default([]),
  password: z.string().max(1024),
});

export const updateUserSchema = z.object({
  name: name.optional(),
  roles: roleList.optional(),
  allSites: z.boolean().optional(),
  siteIds: siteIds.optional(),
  active: z.boolean().optional(),
  password: z.string().max(1024).optional(),
});

export const changePasswordSchema = z.object({
  currentPassword: z.string().min(1, 'Enter your current password.').max(1024),
  newPassword: z.string().max(1024),
});

export const preferencesSchema = z.object({
  displayUnit: z.enum(['F', 'C']),
});

export const userListQuerySchema = z.object({
  search: z.string().trim().max(120).optional(),
  sort: z.enum(['name', 'email', 'createdAt']).default('name'),
  direction: z.enum(['asc', 'desc']).default('asc'),
  page: z.coerce.number().int().min(0).max(100_000).default(0),
  pageSize: z.coerce.number().int().min(1).max(100).default(25),
});

export type CreateUserInput = z.infer<typeof createUserSchema>;
export type UpdateUserInput = z.infer<typeof updateUserSchema>;
