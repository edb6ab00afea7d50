import { z } from 'zod';
import { checkOnWhite, MIN_ON_PAPER } from './contrast';

/** A #rrggbb colour that stays readable on the white report page (the form's own "too faint" line). */
const colour = z
  .string()
  .trim()
  .regex(/^#[0-9a-fA-F]{6}$/, 'must be a colour like #1b7f86')
  .transform((v) => v.toLowerCase())
  .superRefine((v, ctx) => {
    const { ratio } = checkOnWhite(v);
    if (ratio < MIN_ON_PAPER)
      ctx.addIssue({
        code: 'custom',
        message: `is too faint on white: contrast ${ratio.toFixed(2)}:1, and the report needs at least ${MIN_ON_PAPER}:1 (WCAG 2.1) to stay readable. Pick a darker colour.`,
      });
  });

export const brandSchema = z.strictObject({
  companyName: z.string().trim().min(1, 'is required').max(120),
  primaryColour: colour,
  accentColour: colour,
  licenceNumber: z.string().trim().max(120).default(''),
  contactBlock: z.string().trim().max(600).default(''),
  reportFooter: z.string().trim().max(600).default(''),
});
