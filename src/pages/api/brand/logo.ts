import type { APIRoute } from 'astro';
import { deleteLogoFile, LogoError, readLogo, storeLogo } from '../../../lib/brand/logo';
import { logoFromForm } from '../../../lib/brand/upload';
import { getBrand, setLogo } from '../../../lib/data/brands';
import { handle, HttpError } from '../../../lib/jobs/http';
import { jobsViewer, jobsWriter } from '../../../lib/jobs/viewer';

const NONE = { logoFile: null, logoContentType: null, logoWidth: null, logoHeight: null } as const;

/** The organisation's logo, as stored (always re-encoded PNG), never sniffed by the browser. */
export const GET: APIRoute = ({ locals }) =>
  handle(() => {
    const viewer = jobsViewer(locals);
    const brand = getBrand(viewer.orgId);
    const bytes = brand.logoFile ? readLogo(brand.logoFile) : null;
    if (!bytes || !brand.logoContentType) throw new HttpError(404, { error: 'not_found', message: 'No logo yet.' });
    return new Response(new Uint8Array(bytes), {
      headers: {
        'Content-Type': brand.logoContentType,
        'X-Content-Type-Options': 'nosniff',
        'Content-Security-Policy': "default-src 'none'",
        'Cache-Control': 'private, max-age=60',
      },
    });
  });

/** Upload a logo (multipart field "logo"): PNG, JPEG or WebP up to 2 MB, checked by its bytes. */
export const POST: APIRoute = ({ locals, request }) =>
  handle(async () => {
    const viewer = jobsWriter(locals);
    if (locals.role !== 'owner') throw new HttpError(403, { error: 'forbidden', message: 'Only the owner can change the logo.' });
    let stored;
    try {
      stored = await storeLogo(await logoFromForm(request));
    } catch (e) {
      if (e instanceof LogoError) throw new HttpError(e.status, { error: 'bad_logo', message: e.message });
      throw e;
    }
    const logo = { logoFile: stored.file, logoContentType: stored.contentType, logoWidth: stored.width, logoHeight: stored.height };
    const old = setLogo(viewer.orgId, viewer.userId, logo, locals.organisation?.name ?? '');
    if (old) deleteLogoFile(old);
    return Response.json({ logo: { contentType: stored.contentType, width: stored.width, height: stored.height } }, { status: 201 });
  });

export const DELETE: APIRoute = ({ locals }) =>
  handle(() => {
    const viewer = jobsWriter(locals);
    if (locals.role !== 'owner') throw new HttpError(403, { error: 'forbidden', message: 'Only the owner can change the logo.' });
    const old = setLogo(viewer.orgId, viewer.userId, NONE, locals.organisation?.name ?? '');
    if (old) deleteLogoFile(old);
    return new Response(null, { status: 204 });
  });
