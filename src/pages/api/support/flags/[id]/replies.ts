import type { APIRoute } from 'astro';
import { getDb } from '../../../../../lib/db/client';
import { actionError, forbidden, invalid, jsonBody, staffOf } from '../../../../../lib/flags/http';
import { messageSchema } from '../../../../../lib/flags/schemas';
import { addReply } from '../../../../../lib/flags/thread';

/** Reply to the reporter: sent by e-mail and kept in the thread. */
export const POST: APIRoute = async ({ params, request, locals }) => {
  const actor = staffOf(locals);
  if (!actor) return forbidden();
  const parsed = messageSchema.safeParse(await jsonBody(request));
  if (!parsed.success) return invalid(parsed.error);
  try {
    const reply = await addReply(getDb(), actor, params.id ?? '', parsed.data.body);
    return Response.json({ ...reply, kind: 'reply' }, { status: 201 });
  } catch (err) {
    return actionError(err);
  }
};
