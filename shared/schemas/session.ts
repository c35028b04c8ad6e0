import { z } from 'zod';
import { roleSchema } from './roles';

export const signInSchema = z.object({
  email: z.string().trim().toLowerCase().min(1, 'Enter your e-mail address').email('Enter a valid e-mail address, like name@company.com'),
  password: z.string().min(1, 'Enter your password').max(200, 'Password is too long'),
});
export type SignInInput = z.infer<typeof signInSchema>;

export const sessionUserSchema = z.object({
  id: z.number().int(),
  email: z.string(),
  name: z.string(),
  role: roleSchema,
});
export type SessionUser = z.infer<typeof sessionUserSchema>;
