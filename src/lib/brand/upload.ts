import { MAX_LOGO_BYTES, LogoError } from './logo';

/** Room for multipart boundaries and headers around a 2 MB file. */
const MAX_REQUEST = MAX_LOGO_BYTES + 64 * 1024;

/** Read at most MAX_REQUEST bytes of a body; a bigger one is refused without reading it all. */
async function cappedBody(request: Request): Promise<Buffer> {
  const declared = Number(request.headers.get('content-length') ?? 0);
  if (declared > MAX_REQUEST) throw new LogoError(413, 'The logo must be 2 MB or smaller.');
  const reader = request.body?.getReader();
  const chunks: Uint8Array[] = [];
  let size = 0;
  while (reader) {
    const { done, value } = await reader.read();
    if (done) break;
    size += value.length;
    if (size > MAX_REQUEST) {
      await reader.cancel();
      throw new LogoError(413, 'The logo must be 2 MB or smaller.');
    }
    chunks.push(value);
  }
  return Buffer.concat(chunks);
}

/** The bytes of the `logo` field of a multipart form upload. */
export async function logoFromForm(request: Request): Promise<Buffer> {
  const type = request.headers.get('content-type') ?? '';
  if (!/^multipart\/form-data\b/i.test(type)) throw new LogoError(415, 'Upload the logo as a form file.');
  const body = await cappedBody(request);
  let form: FormData;
  try {
    form = await new Response(new Uint8Array(body), { headers: { 'content-type': type } }).formData();
  } catch {
    throw new LogoError(400, 'The upload could not be read.');
  }
  const file = form.get('logo');
  if (!file || typeof file === 'string') throw new LogoError(400, 'Choose a logo file.');
  return Buffer.from(await file.arrayBuffer());
}
