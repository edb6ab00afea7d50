import { eq } from 'drizzle-orm';
import { brands } from '../../../db/schema';
import { getDb } from '../db/client';

export type BrandRow = typeof brands.$inferSelect;
export interface BrandFields {
  companyName: string;
  primaryColour: string;
  accentColour: string;
  licenceNumber: string;
  contactBlock: string;
  reportFooter: string;
}
export interface LogoFields {
  logoFile: string | null;
  logoContentType: 'image/png' | 'image/jpeg' | 'image/webp' | null;
  logoWidth: number | null;
  logoHeight: number | null;
}

/** The organisation's brand kit; defaults (company name = organisation name) until one is saved. */
export function getBrand(orgId: string, orgName = ''): BrandRow {
  const row = getDb().select().from(brands).where(eq(brands.organisationId, orgId)).get();
  return (
    row ?? {
      organisationId: orgId,
      companyName: orgName,
      logoFile: null,
      logoContentType: null,
      logoWidth: null,
      logoHeight: null,
      primaryColour: '#12343b',
      accentColour: '#1b7f86',
      licenceNumber: '',
      contactBlock: '',
      reportFooter: '',
      updatedBy: null,
      updatedAt: new Date(0),
    }
  );
}

function upsert(orgId: string, userId: string | null, set: Partial<BrandFields & LogoFields>, orgName: string): BrandRow {
  const current = getBrand(orgId, orgName);
  const next = { ...current, ...set, organisationId: orgId, updatedBy: userId, updatedAt: new Date() };
  getDb()
    .insert(brands)
    .values(next)
    .onConflictDoUpdate({ target: brands.organisationId, set: { ...set, updatedBy: userId, updatedAt: next.updatedAt } })
    .run();
  return next;
}

export function saveBrand(orgId: string, userId: string | null, fields: BrandFields): BrandRow {
  return upsert(orgId, userId, fields, fields.companyName);
}

/** Point the brand at a new logo (or none); returns the file it replaced, for deletion. */
export function setLogo(orgId: string, userId: string | null, logo: LogoFields, orgName: string): string | null {
  // Read and replace together, so the file handed back is exactly the one no row points at now.
  return getDb().transaction(() => {
    const old = getBrand(orgId, orgName).logoFile;
    upsert(orgId, userId, logo, orgName);
    return old;
  });
}
