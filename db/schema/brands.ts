import { relations } from 'drizzle-orm';
import { integer, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import { organisations } from './organisations';
import { users } from './users';

/** An organisation's brand kit, printed on its reports. One row per organisation. */
export const brands = sqliteTable('brands', {
  organisationId: text('organisation_id')
    .primaryKey()
    .references(() => organisations.id, { onDelete: 'cascade' }),
  companyName: text('company_name').notNull().default(''),
  /** Random file name under DATA_DIR/logos, written by the upload (re-encoded); null = no logo. */
  logoFile: text('logo_file'),
  logoContentType: text('logo_content_type', { enum: ['image/png', 'image/jpeg', 'image/webp'] }),
  logoWidth: integer('logo_width'),
  logoHeight: integer('logo_height'),
  /** #rrggbb; headings and rules on the report. */
  primaryColour: text('primary_colour').notNull().default('#12343b'),
  /** #rrggbb; accents (chart line, table heads). */
  accentColour: text('accent_colour').notNull().default('#1b7f86'),
  licenceNumber: text('licence_number').notNull().default(''),
  contactBlock: text('contact_block').notNull().default(''),
  reportFooter: text('report_footer').notNull().default(''),
  updatedBy: text('updated_by').references(() => users.id, { onDelete: 'set null' }),
  updatedAt: integer('updated_at', { mode: 'timestamp_ms' }).notNull(),
});

export const brandsRelations = relations(brands, ({ one }) => ({
  organisation: one(organisations, {
    fields: [brands.organisationId],
    references: [organisations.id],
  }),
}));
