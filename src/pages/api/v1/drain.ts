/** POST /api/v1/drain — drain-down of a vessel: time and level curve (API v1). */
import type { APIRoute } from 'astro';
import { solveDrain } from '../../../lib/hydraulics';
import { readJsonBody } from '../../../lib/api/body';
import { invalidInputBody } from '../../../lib/api/errors';
import { answer, guarded } from '../../../lib/api/guard';
import { methodNotAllowedRoute, preflightRoute } from '../../../lib/api/method-routes';
import { drainRequestSchema } from '../../../lib/api/schemas-drain';

export const POST: APIRoute = guarded(async (context) => {
  const body = await readJsonBody(context.request);
  if (!body.ok) return body.response;
  const parsed = drainRequestSchema.safeParse(body.value);
  if (!parsed.success) {
    return Response.json(invalidInputBody(parsed.error, body.value), { status: 400 });
  }
  return answer(context, () => solveDrain(parsed.data));
});

export const OPTIONS = preflightRoute(['POST']);
export const ALL = methodNotAllowedRoute(['POST']);
