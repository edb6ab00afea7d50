import type { APIRoute } from 'astro';
import { checkOnWhite, contrastRatio } from '../../../lib/brand/contrast';
import { brandSchema } from '../../../lib/brand/schema';
import { getBrand, saveBrand } from '../../../lib/data/brands';
import type { BrandRow } from '../../../lib/data/brands';
import { handle, HttpError, jsonBody, parseWith } from '../../../lib/jobs/http';
import { jobsViewer, jobsWriter } from '../../../lib/jobs/viewer';

function withContrast(brand: BrandRow): Record<string, unknown> {
  return {
    brand,
    contrast: {
      primary: checkOnWhite(brand.primaryColour),
      accent: checkOnWhite(brand.accentColour),
      betweenColours: contrastRatio(brand.primaryColour, brand.accentColour),
    },
  };
}

function requireOwner(locals: App.Locals): void {
  if (locals.role !== 'owner') throw new HttpError(403, { error: 'forbidden', message: 'Only the owner can change the brand kit.' });
}

export const GET: APIRoute = ({ locals }) =>
  handle(() => {
    const viewer = jobsViewer(locals);
    return Response.json(withContrast(getBrand(viewer.orgId, locals.organisation?.name)));
  });

/** Save the brand kit (owner, full entitlement). */
export const PUT: APIRoute = ({ locals, request }) =>
  handle(async () => {
    const viewer = jobsWriter(locals);
    requireOwner(locals);
    const fields = parseWith(brandSchema, await jsonBody(request));
    return Response.json(withContrast(saveBrand(viewer.orgId, viewer.userId, fields)));
  });
