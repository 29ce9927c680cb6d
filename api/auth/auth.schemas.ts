import { z } from 'zod';

const kinds = [/[a-zA-Z]/, /[0-9]/, /[^a-zA-Z0-9]/];

/** At least 10 characters drawn from at least two kinds (letters, digits, other). */
export const Password = z
  .string()
  .min(10, 'Use at least 10 characters')
  .max(200, 'Use at most 200 characters')
  .refine((value) => kinds.filter((kind) => kind.test(value)).length >= 2, {
    message: 'Mix at least two kinds: letters, digits, other characters',
  });

export const SignUpBody = z.object({
  name: z.string().trim().min(1, 'Give your name').max(120),
  email: z.string().trim().toLowerCase().email('Give a valid e-mail address').max(254),
  password: Password,
});
export type SignUpBody = z.infer<typeof SignUpBody>;

export const SignInBody = z.object({
  email: z.string().trim().toLowerCase().email('Give a valid e-mail address').max(254),
  password: z.string().min(1, 'Give your password').max(200),
});
export type SignInBody = z.infer<typeof SignInBody>;

export const UpdateAccountBody = z.object({
  name: z.string().trim().min(1).max(120).optional(),
  mailPreferences: z.record(z.string(), z.boolean()).optional(),
});
export type UpdateAccountBody = z.infer<typeof UpdateAccountBody>;
