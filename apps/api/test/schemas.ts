import { z } from 'zod';
import { ERROR_CODES } from '@keybed/shared';
export { Me, Member, Invitation, InvitationPreview } from '@keybed/shared';

/** The one error shape every failing response must have. */
export const ErrorBody = z.object({
  error: z.object({
    code: z.enum(ERROR_CODES),
    message: z.string().min(1),
    fields: z.record(z.string(), z.array(z.string())).optional(),
    requestId: z.string().min(1),
  }),
});
