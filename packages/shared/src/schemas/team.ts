import { z } from 'zod';
import { Email, LinkToken, Password, PersonName } from './common';
import { Role } from './auth';

export const Member = z.object({
  id: z.string(),
  userId: z.string(),
  name: z.string(),
  email: z.string(),
  role: Role,
  isActive: z.boolean(),
  joinedAt: z.string(),
});
export type Member = z.infer<typeof Member>;

export const UpdateMemberInput = z
  .object({ role: Role.optional(), isActive: z.boolean().optional() })
  .refine((v) => v.role !== undefined || v.isActive !== undefined, {
    error: 'Change the role or the active flag',
    path: ['role'],
  });
export type UpdateMemberInput = z.infer<typeof UpdateMemberInput>;

export const CreateInvitationInput = z.object({ email: Email, role: Role });
export type CreateInvitationInput = z.infer<typeof CreateInvitationInput>;

export const Invitation = z.object({
  id: z.string(),
  email: z.string(),
  role: Role,
  expiresAt: z.string(),
  createdAt: z.string(),
});
export type Invitation = z.infer<typeof Invitation>;

/** What an invitation link shows before it is accepted (no account needed). */
export const InvitationPreview = z.object({
  workshopName: z.string(),
  email: z.string(),
  role: Role,
  expiresAt: z.string(),
});
export type InvitationPreview = z.infer<typeof InvitationPreview>;

export const AcceptInvitationInput = z.object({ token: LinkToken, name: PersonName, password: Password });
export type AcceptInvitationInput = z.infer<typeof AcceptInvitationInput>;
