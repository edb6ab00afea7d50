/** POST /api/v1/siphon — siphon: flow, crest pressure and verdict (API v1). */
import type { APIRoute } from 'astro';
import { solveSiphon } from '../../../lib/hydraulics';
import { readJsonBody } from '../../../lib/api/body';
import { invalidInputBody } from '../../../lib/api/errors';
import { answer, guarded } from '../../../lib/api/guard';
import { methodNotAllowedRoute, preflightRoute } from '../../../lib/api/method-routes';
import { siphonRequestSchema } from '../../../lib/api/schemas-requests';

export const POST: APIRoute = guarded(async (context) => {
  const body = await readJsonBody(context.request);
  if (!body.ok) return body.response;
  const parsed = siphonRequestSchema.safeParse(body.value);
  if (!parsed.success) {
    return Response.json(invalidInputBody(parsed.error, body.value), { status: 400 });
  }
  return answer(context, () => solveSiphon(parsed.data));
});

export const OPTIONS = preflightRoute(['POST']);
export const ALL = methodNotAllowedRoute(['POST']);
