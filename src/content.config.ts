import { defineCollection, z } from 'astro:content';
import { glob } from 'astro/loaders';

/** Short practical guides for crews, one Markdown file each in src/content/guides. */
const guides = defineCollection({
  loader: glob({ pattern: '*.md', base: './src/content/guides' }),
  schema: z.object({
    title: z.string().min(3).max(80),
    summary: z.string().min(10).max(240),
    /** Position in the guide list, lowest first. */
    order: z.number().int().nonnegative(),
    /** Date the guide was last checked. */
    updated: z.coerce.date(),
    /** The tool the guide points a reader to. */
    tool: z.object({ href: z.string().startsWith('/'), label: z.string() }).optional(),
  }),
});

export const collections = { guides };
