import { z } from 'zod';
import { roleSchema, uuidSchema } from './common.js';

export const loginRequestSchema = z.object({
  email: z.email({ error: 'Enter a valid e-mail address' }).max(254),
  password: z.string().min(1, { error: 'Enter your password' }).max(200),
});
export type LoginRequest = z.infer<typeof loginRequestSchema>;

export const userSchema = z.object({
  id: uuidSchema,
  email: z.email(),
  name: z.string(),
  role: roleSchema,
  siteIds: z.array(uuidSchema),
});
export type User = z.infer<typeof userSchema>;

export const loginResponseSchema = z.object({ accessToken: z.string(), user: userSchema });
export type LoginResponse = z.infer<typeof loginResponseSchema>;
