import { z } from 'zod';

const colour = z
  .string()
  .trim()
  .regex(/^#[0-9a-fA-F]{6}$/, 'must be a colour like #1b7f86')
  .transform((v) => v.toLowerCase());

export const brandSchema = z.strictObject({
  companyName: z.string().trim().min(1, 'is required').max(120),
  primaryColour: colour,
  accentColour: colour,
  licenceNumber: z.string().trim().max(120).default(''),
  contactBlock: z.string().trim().max(600).default(''),
  reportFooter: z.string().trim().max(600).default(''),
});
