/** GET /api/v1/water?temperature_c=T&altitude_m=z — water properties and air pressure (API v1). */
import type { APIRoute } from 'astro';
import { invalidInputBody } from '../../../lib/api/errors';
import { answer, guarded } from '../../../lib/api/guard';
import { issueAt } from '../../../lib/api/issues';
import { methodNotAllowedRoute, preflightRoute } from '../../../lib/api/method-routes';
import { waterQuerySchema } from '../../../lib/api/schemas-requests';
import { queryObject, waterAnswer } from '../../../lib/api/water-view';

export const GET: APIRoute = guarded((context) => {
  const query = queryObject(context.url.searchParams);
  if (query.repeated) {
    const issues = [issueAt(query.repeated, 'is given more than once')];
    return Response.json({ error: 'invalid_input', issues }, { status: 400 });
  }
  const parsed = waterQuerySchema.safeParse(query.value);
  if (!parsed.success) {
    return Response.json(invalidInputBody(parsed.error, query.value), { status: 400 });
  }
  return answer(context, () => waterAnswer(parsed.data.temperature_c, parsed.data.altitude_m));
});

export const HEAD = GET;
export const OPTIONS = preflightRoute(['GET', 'HEAD']);
export const ALL = methodNotAllowedRoute(['GET', 'HEAD']);
