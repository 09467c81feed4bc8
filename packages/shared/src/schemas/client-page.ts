import { z } from 'zod';
import { Email, Id, LinkToken, PersonName } from './common';
import { MoneyTotals } from './estimates';
import { BasisPoints } from './settings';
import { Caution, SurveyChoice, SurveyGrade } from './surveys';
import { KeytopMaterial, PianoType } from './pianos';

/*
 * The client's private page (`/c/:token`, no account). The link is random, stored as its SHA-256,
 * expires after the workshop's link lifetime, can be withdrawn, and belongs to one estimate
 * revision: once a newer revision is issued the old link says so (409 link_superseded).
 */

/** `GET/PUT /api/client-terms` (owner; the foreman reads): the workshop's details, terms, deposit and link rules. */
export const PutClientTermsInput = z.object({
  address: z.string().trim().max(500).default(''),
  phone: z.string().trim().max(60).default(''),
  email: z.union([Email, z.literal('')]).default(''),
  vatNumber: z.string().trim().max(40).default(''),
  terms: z.string().trim().max(10_000, { error: 'Terms are too long' }).default(''),
  /** Share of the accepted total (with tax) asked as a card deposit; 0 asks none. */
  depositBasisPoints: BasisPoints,
  linkLifetimeDays: z.number({ error: 'Enter a number of days' }).int().min(1, { error: 'At least one day' }).max(365, { error: 'At most a year' }),
});
export type PutClientTermsInput = z.infer<typeof PutClientTermsInput>;

export const ClientTerms = PutClientTermsInput.extend({ email: z.string(), updatedAt: z.string().nullable() });
export type ClientTerms = z.infer<typeof ClientTerms>;

/** `POST /api/estimates/:id/send` (owner, foreman): issues a draft if needed and e-mails the link and the PDF. */
export const SendEstimateInput = z.object({
  /** Defaults to the client's e-mail. */
  to: Email.optional(),
  message: z.string().trim().max(2000, { error: 'Message is too long' }).default(''),
});
export type SendEstimateInput = z.infer<typeof SendEstimateInput>;

export const ClientLinkSummary = z.object({
  id: z.string(),
  estimateId: z.string(),
  sentTo: z.string(),
  expiresAt: z.string(),
  revokedAt: z.string().nullable(),
  lastOpenedAt: z.string().nullable(),
  createdAt: z.string(),
});
export type ClientLinkSummary = z.infer<typeof ClientLinkSummary>;

export const SendEstimateResult = z.object({ link: ClientLinkSummary });

export const ClientTokenParams = z.object({ token: LinkToken });
export const ClientPhotoParams = z.object({ token: LinkToken, photoId: Id });

/** `POST /api/client/:token/accept`: one option per choice and the client's name as they sign. */
export const ClientAcceptInput = z.object({
  optionIds: z
    .array(Id)
    .max(20)
    .refine((ids) => new Set(ids).size === ids.length, { error: 'An option is listed twice' })
    .default([]),
  name: PersonName,
});
export type ClientAcceptInput = z.infer<typeof ClientAcceptInput>;

export const ClientDeclineInput = z.object({ reason: z.string().trim().max(2000, { error: 'Reason is too long' }).optional() });
export type ClientDeclineInput = z.infer<typeof ClientDeclineInput>;

const ClientLine = z.object({ description: z.string(), quantityText: z.string(), amountMinor: z.number() });

export const ClientPage = z.object({
  workshop: z.object({ name: z.string(), address: z.string(), phone: z.string(), email: z.string(), vatNumber: z.string(), terms: z.string() }),
  client: z.object({ name: z.string() }),
  piano: z.object({ maker: z.string(), model: z.string(), type: PianoType, yearApprox: z.number().nullable(), sizeMm: z.number().nullable(), keytopMaterial: KeytopMaterial }),
  survey: z
    .object({
      surveyedOn: z.string(),
      overallGrade: SurveyGrade.nullable(),
      overallCondition: z.string(),
      recommendedWork: z.string(),
      choices: z.array(SurveyChoice),
      findings: z.array(z.object({ area: z.string(), name: z.string(), grade: SurveyGrade, note: z.string(), photoIds: z.array(z.string()) })),
    })
    .nullable(),
  estimate: z.object({
    id: z.string(),
    revision: z.number(),
    title: z.string(),
    notes: z.string(),
    status: z.enum(['issued', 'accepted', 'declined']),
    currency: z.string(),
    taxRateBasisPoints: z.number(),
    includedLines: z.array(ClientLine),
    choices: z.array(z.object({ choice: z.string(), options: z.array(z.object({ id: z.string(), name: z.string(), netMinor: z.number(), isChosen: z.boolean(), lines: z.array(ClientLine) })) })),
    /** With the first option of each choice until accepted, then the chosen ones. */
    totals: MoneyTotals,
    issuedAt: z.string().nullable(),
  }),
  response: z
    .object({ answer: z.enum(['accepted', 'declined']), name: z.string().nullable(), at: z.string(), optionIds: z.array(z.string()) })
    .nullable(),
  deposit: z
    .object({
      basisPoints: z.number(),
      amountMinor: z.number(),
      status: z.enum(['due', 'pending', 'paid']),
      paidAt: z.string().nullable(),
      /** Card payments are set up for this workshop. */
      isPayable: z.boolean(),
    })
    .nullable(),
  cautions: z.array(Caution),
  expiresAt: z.string(),
});
export type ClientPage = z.infer<typeof ClientPage>;

export const ClientDepositResult = z.object({ checkoutUrl: z.string() });
export type ClientDepositResult = z.infer<typeof ClientDepositResult>;

export const Payment = z.object({
  id: z.string(),
  estimateId: z.string(),
  kind: z.enum(['deposit']),
  status: z.enum(['pending', 'paid']),
  amountMinor: z.number(),
  currency: z.string(),
  paidAt: z.string().nullable(),
  createdAt: z.string(),
});
export type Payment = z.infer<typeof Payment>;

/** `GET /api/jobs/:id/payments` (owner, foreman): money received from the client, and what is waiting. */
export const JobPayments = z.object({ payments: z.array(Payment), receivedMinor: z.number() });
export type JobPayments = z.infer<typeof JobPayments>;
