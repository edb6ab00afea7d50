import type { APIRoute } from 'astro';
import { z } from 'zod';
import { saveUnitSystem } from '../../../lib/data/users';
import { unitSystems } from '../../../lib/hydraulics/units';
import { handle, jsonBody, parseWith } from '../../../lib/jobs/http';

const unitsSchema = z.strictObject({ unit_system: z.enum(unitSystems) });

/**
 * Remember the crew's unit system on their account. The calculators send every switch here
 * without knowing who is signed in (their pages are prerendered), so a signed-out switch is
 * answered too, with `saved: false`: it stays in that browser only.
 */
export const PUT: APIRoute = ({ request, locals }) =>
  handle(async () => {
    const { unit_system } = parseWith(unitsSchema, await jsonBody(request));
    if (!locals.user) return Response.json({ saved: false, unit_system });
    saveUnitSystem(locals.user.id, unit_system);
    return Response.json({ saved: true, unit_system });
  });
