import {
  CAUTIONS,
  formatMoney,
  SurveyChoice,
  type Caution,
  type ClientAcceptInput,
  type ClientDeclineInput,
  type ClientLinkSummary,
  type ClientPage,
  type ClientTerms,
  type Estimate,
  type PutClientTermsInput,
  type SendEstimateInput,
} from '@keybed/shared';
import type { AuthContext } from '../../http/context';
import { AppError, notFound } from '../../http/errors';
import { notifyLive, type Changed } from '../../lib/live-events';
import type { Logger } from '../../lib/logger';
import type { Mailer } from '../../lib/mail';
import type { Storage } from '../../lib/storage';
import { hashLinkToken, newLinkToken } from '../../lib/tokens';
import type { EstimatesService } from '../estimates/estimates.service';
import type { PaymentsService } from '../payments/payments.service';
import type { ProposedJobsRepo } from '../surveys/proposed-jobs.repo';
import type { ClientPageRepo, LinkRow } from './client-page.repo';
import { depositMinor, toClientEstimate } from './estimate-document';
import { renderEstimatePdf, type EstimatePdfModel } from './estimate-pdf';

interface Deps {
  repo: ClientPageRepo;
  jobs: ProposedJobsRepo;
  estimates: EstimatesService;
  payments: PaymentsService;
  storage: Storage;
  mailer: Mailer;
  logger: Logger;
  appOrigin: string;
  now: () => Date;
  changed: Changed;
}

const DAY_MS = 24 * 3600_000;
const DEFAULT_TERMS = { address: '', phone: '', email: '', vatNumber: '', terms: '', depositBasisPoints: 3000, linkLifetimeDays: 30 };

const toLinkSummary = (l: LinkRow): ClientLinkSummary => ({
  id: l.id,
  estimateId: l.estimateId,
  sentTo: l.sentTo,
  expiresAt: l.expiresAt.toISOString(),
  revokedAt: l.revokedAt?.toISOString() ?? null,
  lastOpenedAt: l.lastOpenedAt?.toISOString() ?? null,
  createdAt: l.createdAt.toISOString(),
});

const sameIds = (a: readonly string[], b: readonly string[]) => a.length === b.length && [...a].sort().join() === [...b].sort().join();

/**
 * The estimate sent to the client and the client's private page: PDF, link by e-mail, the page,
 * acceptance (which puts the proposed job on the board through the estimates service's accept),
 * refusal, and the card deposit.
 */
export function createClientPageService(d: Deps) {
  const { repo, estimates, now } = d;

  async function termsOf(workshopId: string) {
    return { ...DEFAULT_TERMS, ...(await repo.terms(workshopId)) };
  }

  /** Who the link acts as inside the workshop: the member who sent it (else an owner), with the owner's view of prices. */
  async function principalOf(link: LinkRow): Promise<AuthContext> {
    const userId = link.sentBy ?? (await repo.anyOwnerId(link.workshopId));
    if (!userId) throw new AppError('service_unavailable', 503, 'This workshop cannot take answers online just now. Please contact them.');
    return { userId, workshopId: link.workshopId, role: 'owner', membershipId: '', sessionId: '' };
  }

  /** The page's model (also the PDF's): only what the client may see. */
  async function model(auth: AuthContext, estimate: Estimate) {
    const [context, terms, workshopName] = await Promise.all([repo.context(auth.workshopId, estimate.id), termsOf(auth.workshopId), repo.workshopName(auth.workshopId)]);
    if (!context) throw notFound('That estimate');
    const surveyData = await repo.surveyOfJob(auth.workshopId, context.jobId);
    const clientEstimate = toClientEstimate(estimate);
    const cautions: Caution[] = [...(context.piano.keytopMaterial === 'ivory' || surveyData?.survey.keytopMaterial === 'ivory' ? [CAUTIONS.ivory] : []), CAUTIONS.moving];
    const deposit = terms.depositBasisPoints > 0 ? { basisPoints: terms.depositBasisPoints, amountMinor: depositMinor(clientEstimate.totals.grossMinor, terms.depositBasisPoints) } : null;
    const survey = surveyData
      ? {
          surveyedOn: surveyData.survey.surveyedOn,
          overallGrade: surveyData.survey.overallGrade,
          overallCondition: surveyData.survey.overallCondition,
          recommendedWork: surveyData.survey.recommendedWork,
          choices: SurveyChoice.array().parse(surveyData.survey.choices),
          findings: surveyData.components.map((c) => ({ area: c.area, name: c.name, grade: c.grade!, note: c.note, photoIds: surveyData.photos.filter((p) => p.surveyComponentId === c.id).map((p) => p.id) })),
        }
      : null;
    return {
      context,
      terms,
      pdf: {
        workshop: { name: workshopName, address: terms.address, phone: terms.phone, email: terms.email, vatNumber: terms.vatNumber, terms: terms.terms },
        client: { name: context.client.name },
        piano: { maker: context.piano.maker, model: context.piano.model, type: context.piano.type, yearApprox: context.piano.yearApprox, sizeMm: context.piano.sizeMm, keytopMaterial: context.piano.keytopMaterial },
        survey,
        estimate: clientEstimate,
        cautions,
        deposit,
      } satisfies EstimatePdfModel,
    };
  }

  /** The link behind a token, refused with a clear reason when it cannot be used. */
  async function resolve(token: string) {
    const found = await repo.linkByHash(hashLinkToken(token));
    if (!found) throw new AppError('token_invalid', 404, 'This link is not valid. Check that it was copied whole, or ask the workshop to send it again.');
    const { link, estimate } = found;
    if (link.revokedAt) throw new AppError('link_revoked', 410, 'The workshop has withdrawn this link. Please contact them for the current estimate.');
    if (link.expiresAt.getTime() <= now().getTime()) throw new AppError('link_expired', 410, 'This link has expired. Ask the workshop to send the estimate again.');
    if (estimate.status === 'superseded' || estimate.status === 'draft') {
      throw new AppError('link_superseded', 409, 'The workshop has revised this estimate since this link was sent. Use the link in their latest e-mail.');
    }
    return { link, estimate, auth: await principalOf(link) };
  }

  async function page(auth: AuthContext, link: LinkRow, estimateId: string): Promise<ClientPage> {
    const estimate = await estimates.get(auth, estimateId);
    const [{ pdf }, response, payment] = await Promise.all([model(auth, estimate), repo.response(estimateId), repo.deposit(estimateId)]);
    const isAccepted = estimate.status === 'accepted';
    return {
      ...pdf,
      response: response ? { answer: response.answer, name: response.name, at: response.at.toISOString(), optionIds: response.optionIds } : null,
      deposit:
        isAccepted && pdf.deposit
          ? {
              ...pdf.deposit,
              amountMinor: payment?.amountMinor ?? pdf.deposit.amountMinor,
              status: payment?.status === 'paid' ? 'paid' : payment ? 'pending' : 'due',
              paidAt: payment?.paidAt?.toISOString() ?? null,
              isPayable: d.payments.isAvailable(),
            }
          : null,
      expiresAt: link.expiresAt.toISOString(),
    };
  }

  async function notify(to: string[], subject: string, text: string) {
    for (const address of to) await d.mailer.send({ to: address, subject, text }).catch((err: unknown) => d.logger.error({ err }, 'a notice e-mail could not be sent'));
  }

  return {
    async getTerms(auth: AuthContext): Promise<ClientTerms> {
      const row = await repo.terms(auth.workshopId);
      const { workshopId: _w, updatedAt, ...values } = row ?? { ...DEFAULT_TERMS, workshopId: auth.workshopId, updatedAt: null };
      return { ...values, updatedAt: updatedAt?.toISOString() ?? null };
    },

    async putTerms(auth: AuthContext, input: PutClientTermsInput): Promise<ClientTerms> {
      const at = now();
      await repo.putTerms(auth.workshopId, input, at);
      return { ...input, updatedAt: at.toISOString() };
    },

    async pdf(auth: AuthContext, estimateId: string) {
      const estimate = await estimates.get(auth, estimateId);
      const { pdf } = await model(auth, estimate);
      return { body: await renderEstimatePdf(pdf), filename: `estimate-${estimate.revision}.pdf` };
    },

    /** Issues a draft if needed, then e-mails the client a private link with the PDF attached. */
    async send(auth: AuthContext, estimateId: string, input: SendEstimateInput) {
      let estimate = await estimates.get(auth, estimateId);
      if (estimate.status === 'draft') estimate = await estimates.issue(auth, estimateId);
      if (estimate.status !== 'issued') throw new AppError('estimate_status', 409, 'Only an estimate waiting for the client’s answer can be sent');
      const { context, terms, pdf } = await model(auth, estimate);
      const to = input.to ?? context.client.email;
      if (!to) throw new AppError('validation_failed', 400, 'The client has no e-mail address. Add one, or give the address to send to.', { to: ['Give an e-mail address'] });
      const { token, tokenHash } = newLinkToken();
      const at = now();
      const link = await repo.insertLink({ workshopId: auth.workshopId, estimateId, tokenHash, sentTo: to, sentBy: auth.userId, expiresAt: new Date(at.getTime() + terms.linkLifetimeDays * DAY_MS), createdAt: at });
      const total = formatMoney(pdf.estimate.totals.grossMinor, pdf.estimate.currency, 'en-GB');
      await d.mailer.send({
        to,
        subject: `Your estimate from ${pdf.workshop.name}`,
        text: [
          `Dear ${context.client.name},`,
          '',
          `${pdf.workshop.name} has prepared an estimate for your ${[context.piano.maker, context.piano.model].filter(Boolean).join(' ')} piano (total ${total} with VAT${pdf.estimate.choices.length > 0 ? ', depending on the options you choose' : ''}).`,
          ...(input.message ? ['', input.message] : []),
          '',
          `See it, choose your options and answer here (the link works for ${terms.linkLifetimeDays} days):`,
          `${d.appOrigin}/c/${token}`,
          '',
          'The estimate is attached as a PDF too. The link is private: please do not forward it.',
        ].join('\n'),
        attachments: [{ filename: `estimate-${estimate.revision}.pdf`, content: await renderEstimatePdf(pdf), contentType: 'application/pdf' }],
      });
      return { link: toLinkSummary(link) };
    },

    async links(auth: AuthContext, estimateId: string) {
      if (!(await repo.context(auth.workshopId, estimateId))) throw notFound('That estimate');
      return { links: (await repo.linksOf(auth.workshopId, estimateId)).map(toLinkSummary) };
    },

    async revoke(auth: AuthContext, linkId: string) {
      const link = await repo.revokeLink(auth.workshopId, linkId, now());
      if (!link) throw notFound('That link');
      return toLinkSummary(link);
    },

    async open(token: string): Promise<ClientPage> {
      const { link, estimate, auth } = await resolve(token);
      await repo.markOpened(link.id, now());
      return page(auth, link, estimate.id);
    },

    /**
     * Records the client's acceptance of this exact revision. Two submissions at once: the
     * estimates service lets one accept; the other finds it accepted with the same options and
     * answers the same page. The estimates service's acceptance puts the proposed job on the board
     * (once, at the end of the first stage), as when the owner records it in the app.
     */
    async accept(token: string, input: ClientAcceptInput, ipAddress: string): Promise<ClientPage> {
      const { link, estimate, auth } = await resolve(token);
      if (estimate.status === 'declined') throw new AppError('estimate_status', 409, 'This estimate was declined. Please contact the workshop if you have changed your mind.');
      let isFirst = false;
      if (estimate.status === 'issued') {
        try {
          await estimates.accept(auth, estimate.id, { optionIds: input.optionIds }, { byClient: true });
          isFirst = true;
        } catch (err) {
          if (!(err instanceof AppError && err.code === 'estimate_status')) throw err;
        }
      }
      const accepted = await estimates.get(auth, estimate.id);
      if (accepted.status !== 'accepted') throw new AppError('estimate_status', 409, 'This estimate can no longer be accepted. Please contact the workshop.');
      const chosen = accepted.options.filter((o) => o.isChosen).map((o) => o.id);
      if (!sameIds(chosen, input.optionIds)) throw new AppError('estimate_status', 409, 'This estimate was already accepted with other options. Please contact the workshop to change them.');
      const at = now();
      await repo.transaction((tx) =>
        repo.recordResponse(tx, { workshopId: link.workshopId, linkId: link.id, estimateId: estimate.id, answer: 'accepted', revision: accepted.revision, estimateVersion: estimate.version, optionIds: chosen, name: input.name, ipAddress, at }),
      );
      const result = await page(auth, link, estimate.id);
      if (isFirst) {
        const total = formatMoney(result.estimate.totals.grossMinor, result.estimate.currency, 'en-GB');
        const options = result.estimate.choices.flatMap((c) => c.options.filter((o) => o.isChosen).map((o) => `${c.choice}: ${o.name}`));
        const summary = [`Estimate revision ${result.estimate.revision}${result.estimate.title ? ` (${result.estimate.title})` : ''}`, ...options, `Total ${total} with VAT`].join('\n');
        await notify(await repo.ownerEmails(link.workshopId), `${result.client.name} accepted estimate ${result.estimate.revision}`, `${input.name} accepted for ${result.client.name} on ${at.toISOString()}.\n\n${summary}\n\nThe job is on the board in its first stage.`);
        await notify([link.sentTo], `Your acceptance: ${result.workshop.name}`, `Dear ${result.client.name},\n\nThank you. We have recorded your acceptance, signed "${input.name}", on ${at.toUTCString()}.\n\n${summary}\n${result.deposit ? `\nA deposit of ${formatMoney(result.deposit.amountMinor, result.estimate.currency, 'en-GB')} can be paid by card on your page:\n${d.appOrigin}/c/${token}\n` : ''}\n${result.workshop.name}`);
      }
      return result;
    },

    async decline(token: string, input: ClientDeclineInput, ipAddress: string): Promise<ClientPage> {
      const { link, estimate, auth } = await resolve(token);
      if (estimate.status === 'accepted') throw new AppError('estimate_status', 409, 'This estimate is already accepted. Please contact the workshop to change it.');
      let isFirst = false;
      if (estimate.status === 'issued') {
        try {
          await estimates.decline(auth, estimate.id);
          isFirst = true;
        } catch (err) {
          if (!(err instanceof AppError && err.code === 'estimate_status')) throw err;
        }
      }
      const at = now();
      await repo.transaction(async (tx) => {
        if (estimate.kind === 'original') await d.jobs.cancelProposed(tx, link.workshopId, estimate.jobId, at);
        await repo.recordResponse(tx, { workshopId: link.workshopId, linkId: link.id, estimateId: estimate.id, answer: 'declined', revision: estimate.revision, estimateVersion: estimate.version, reason: input.reason ?? null, ipAddress, at });
        await notifyLive(tx, link.workshopId, 'job.updated', estimate.jobId, at);
      });
      d.changed(link.workshopId);
      const result = await page(auth, link, estimate.id);
      if (isFirst) {
        await notify(await repo.ownerEmails(link.workshopId), `${result.client.name} declined estimate ${result.estimate.revision}`, `The estimate was declined on ${at.toISOString()}.${input.reason ? `\n\nReason given: ${input.reason}` : ''}`);
      }
      return result;
    },

    async deposit(token: string) {
      const { link, estimate, auth } = await resolve(token);
      if (estimate.status !== 'accepted') throw new AppError('estimate_status', 409, 'Accept the estimate before paying the deposit');
      const current = await page(auth, link, estimate.id);
      if (!current.deposit) throw new AppError('conflict', 409, 'This workshop asks no deposit by card');
      return d.payments.startDeposit({
        workshopId: link.workshopId,
        jobId: estimate.jobId,
        estimateId: estimate.id,
        amountMinor: current.deposit.amountMinor,
        currency: current.estimate.currency,
        description: `Deposit: ${current.workshop.name}, estimate ${current.estimate.revision}`,
        successUrl: `${d.appOrigin}/c/${token}?deposit=paid`,
        cancelUrl: `${d.appOrigin}/c/${token}?deposit=cancelled`,
        email: link.sentTo,
      });
    },

    /** A photo shown on the client's page: only those the owner chose to share, of this estimate's survey. */
    async photo(token: string, photoId: string, size: 'web' | 'thumb') {
      const { link, estimate } = await resolve(token);
      const photo = await repo.sharedPhoto(link.workshopId, estimate.jobId, photoId);
      if (!photo) throw notFound('That photo');
      const body = await d.storage.get(size === 'thumb' ? photo.thumbKey : photo.storageKey);
      if (!body) throw notFound('That photo');
      return body;
    },
  };
}

export type ClientPageService = ReturnType<typeof createClientPageService>;
