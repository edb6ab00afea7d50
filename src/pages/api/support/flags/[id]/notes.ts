import type { APIRoute } from 'astro';
import { getDb } from '../../../../../lib/db/client';
import { actionError, forbidden, invalid, jsonBody, staffOf } from '../../../../../lib/flags/http';
import { messageSchema } from '../../../../../lib/flags/schemas';
import { addNote } from '../../../../../lib/flags/thread';

/** Add an internal note (never shown to the reporter). */
export const POST: APIRoute = async ({ params, request, locals }) => {
  const actor = staffOf(locals);
  if (!actor) return forbidden();
  const parsed = messageSchema.safeParse(await jsonBody(request));
  if (!parsed.success) return invalid(parsed.error);
  try {
    const id = addNote(getDb(), actor, params.id ?? '', parsed.data.body);
    return Response.json({ id, kind: 'note' }, { status: 201 });
  } catch (err) {
    return actionError(err);
  }
};
