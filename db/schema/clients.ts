import { sql } from 'drizzle-orm';
import { check, foreignKey, index, integer, pgEnum, pgTable, text, unique, uuid } from 'drizzle-orm/pg-core';
import { createdAt, id, instant } from './columns';
import { workshops } from './workshops';

export const clients = pgTable(
  'clients',
  {
    id: id(),
    workshopId: uuid()
      .notNull()
      .references(() => workshops.id, { onDelete: 'cascade' }),
    name: text().notNull(),
    email: text(),
    phone: text(),
    /** Postal address as the client writes it, lines separated by newlines. */
    address: text(),
    notes: text().notNull().default(''),
    createdAt: createdAt(),
    updatedAt: instant().notNull().defaultNow(),
  },
  (t) => [
    unique('clients_id_workshop').on(t.id, t.workshopId),
    check('clients_name_not_blank', sql`length(trim(${t.name})) > 0`),
    index('clients_workshop_name').on(t.workshopId, sql`lower(${t.name})`),
  ],
);

export const pianoTypeEnum = pgEnum('piano_type', ['grand', 'upright', 'square', 'other']);
export const keytopMaterialEnum = pgEnum('keytop_material', ['ivory', 'plastic', 'other', 'unknown']);

export const pianos = pgTable(
  'pianos',
  {
    id: id(),
    workshopId: uuid()
      .notNull()
      .references(() => workshops.id, { onDelete: 'cascade' }),
    clientId: uuid().notNull(),
    maker: text().notNull(),
    model: text().notNull().default(''),
    serialNumber: text().notNull().default(''),
    type: pianoTypeEnum().notNull(),
    /** A grand's length or an upright's height, in millimetres. */
    sizeMm: integer(),
    /** Approximate year of manufacture. */
    yearApprox: integer(),
    caseFinish: text().notNull().default(''),
    keytopMaterial: keytopMaterialEnum().notNull().default('unknown'),
    notes: text().notNull().default(''),
    createdAt: createdAt(),
    updatedAt: instant().notNull().defaultNow(),
  },
  (t) => [
    unique('pianos_id_workshop').on(t.id, t.workshopId),
    // The owner must belong to the same workshop as the piano.
    foreignKey({ name: 'pianos_client_same_workshop', columns: [t.clientId, t.workshopId], foreignColumns: [clients.id, clients.workshopId] }),
    check('pianos_maker_not_blank', sql`length(trim(${t.maker})) > 0`),
    check('pianos_size_plausible', sql`${t.sizeMm} is null or (${t.sizeMm} > 0 and ${t.sizeMm} <= 4000)`),
    check('pianos_year_plausible', sql`${t.yearApprox} is null or (${t.yearApprox} between 1700 and 2100)`),
    index().on(t.workshopId, t.clientId),
  ],
);
