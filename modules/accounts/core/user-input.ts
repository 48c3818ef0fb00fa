import { z } from '@/modules/input/core/zod';

import { lineText } from '@/modules/input/core/text';

import { ROLES } from './roles';

// Minimum length per NIST SP 800-63B for user-chosen secrets is 8; the shop asks for 10.
export const PASSWORD_MIN_LENGTH = 10;

export const emailSchema = lineText().trim().toLowerCase().pipe(z.email({ message: 'must be an e-mail address' })).pipe(z.string().max(254));

export const loginInput = z.object({
  email: lineText().max(254),
  password: z.string().max(200),
});

export const newUserInput = z.object({
  email: emailSchema,
  name: lineText().trim().min(1, 'is required').max(120),
  role: z.enum(ROLES, { message: `must be one of ${ROLES.join(', ')}` }),
  password: lineText().min(PASSWORD_MIN_LENGTH, `must be at least ${PASSWORD_MIN_LENGTH} characters`).max(200),
});
export type NewUserInput = z.infer<typeof newUserInput>;

export const roleChangeInput = z.object({
  userId: z.number().int().positive(),
  role: z.enum(ROLES, { message: `must be one of ${ROLES.join(', ')}` }),
});
