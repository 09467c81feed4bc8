import { createRequire } from 'node:module';
import fs from 'node:fs';
import PDFDocument from 'pdfkit';
import { formatMoney, SURVEY_GRADE_LABELS, type ClientPage } from '@keybed/shared';

const require = createRequire(import.meta.url);
/** Source Sans 3 as shipped by @fontsource (SIL Open Font License 1.1); pdfkit reads WOFF directly. */
const font = (weight: 400 | 600) => fs.readFileSync(require.resolve(`@fontsource/source-sans-3/files/source-sans-3-latin-${weight}-normal.woff`));
const FONTS = { regular: font(400), bold: font(600) };

const INK = '#1f2328';
const MUTED = '#5b6169';
const RULE = '#c9ccd1';

type Doc = InstanceType<typeof PDFDocument>;

/** What the PDF shows: the client page's model (nothing the client may not see is in it). */
export type EstimatePdfModel = Omit<ClientPage, 'response' | 'expiresAt' | 'deposit'> & { deposit: { basisPoints: number; amountMinor: number } | null };

function heading(doc: Doc, text: string) {
  doc.moveDown(0.8).font('bold').fontSize(13).fillColor(INK).text(text).moveDown(0.2);
}

/** One line: description left, quantity and amount right-aligned in fixed columns. */
function row(doc: Doc, description: string, quantity: string, amount: string, opts: { isBold?: boolean } = {}) {
  const left = doc.page.margins.left;
  const width = doc.page.width - left - doc.page.margins.right;
  const y = doc.y;
  doc.font(opts.isBold ? 'bold' : 'regular').fontSize(10.5).fillColor(INK);
  doc.text(description, left, y, { width: width - 170 });
  const after = doc.y;
  doc.text(quantity, left + width - 170, y, { width: 70, align: 'right' });
  doc.text(amount, left + width - 95, y, { width: 95, align: 'right' });
  doc.x = left;
  doc.y = Math.max(after, doc.y) + 2;
}

function rule(doc: Doc) {
  const left = doc.page.margins.left;
  doc.moveTo(left, doc.y).lineTo(doc.page.width - doc.page.margins.right, doc.y).strokeColor(RULE).lineWidth(0.7).stroke();
  doc.moveDown(0.3);
}

/** The estimate as a PDF: workshop, client and piano, lines by option, totals with VAT, cautions and terms. */
export function renderEstimatePdf(m: EstimatePdfModel): Promise<Buffer> {
  const doc = new PDFDocument({ size: 'A4', margin: 50, info: { Title: `Estimate ${m.estimate.revision}: ${m.estimate.title}`, Author: m.workshop.name } });
  doc.registerFont('regular', FONTS.regular);
  doc.registerFont('bold', FONTS.bold);
  const money = (minor: number) => formatMoney(minor, m.estimate.currency, 'en-GB');
  const chunks: Buffer[] = [];
  doc.on('data', (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });

  doc.font('bold').fontSize(18).fillColor(INK).text(m.workshop.name);
  const details = [m.workshop.address.replace(/\n/g, ', '), [m.workshop.phone, m.workshop.email].filter(Boolean).join(' · '), m.workshop.vatNumber ? `VAT no. ${m.workshop.vatNumber}` : '']
    .filter(Boolean)
    .join('\n');
  if (details) doc.font('regular').fontSize(10).fillColor(MUTED).text(details);

  doc.moveDown(1).font('bold').fontSize(15).fillColor(INK).text(`Estimate, revision ${m.estimate.revision}${m.estimate.title ? `: ${m.estimate.title}` : ''}`);
  const piano = [m.piano.maker, m.piano.model, m.piano.type, m.piano.yearApprox ? `c. ${m.piano.yearApprox}` : '', m.piano.sizeMm ? `${m.piano.sizeMm} mm` : ''].filter(Boolean).join(', ');
  doc.font('regular').fontSize(10.5).fillColor(INK).text(`For ${m.client.name}. Piano: ${piano}.`);
  if (m.estimate.issuedAt) doc.text(`Issued ${new Date(m.estimate.issuedAt).toLocaleDateString('en-GB', { day: 'numeric', month: 'long', year: 'numeric', timeZone: 'Europe/London' })}.`);

  if (m.survey) {
    heading(doc, 'What we found');
    if (m.survey.overallCondition) doc.font('regular').fontSize(10.5).text(m.survey.overallCondition);
    for (const f of m.survey.findings) doc.text(`${f.area}, ${f.name}: ${SURVEY_GRADE_LABELS[f.grade]}${f.note ? `. ${f.note}` : ''}`, { indent: 10 });
    if (m.survey.recommendedWork) doc.moveDown(0.3).text(`Recommended: ${m.survey.recommendedWork}`);
  }

  if (m.estimate.includedLines.length > 0) {
    heading(doc, 'Included in every option');
    for (const l of m.estimate.includedLines) row(doc, l.description, l.quantityText, money(l.amountMinor));
  }
  for (const choice of m.estimate.choices) {
    heading(doc, `Your choice: ${choice.choice}`);
    for (const option of choice.options) {
      row(doc, `Option: ${option.name}`, '', money(option.netMinor), { isBold: true });
      for (const l of option.lines) row(doc, `   ${l.description}`, l.quantityText, money(l.amountMinor));
    }
  }

  const scope = m.estimate.choices.length > 0 ? (m.estimate.status === 'accepted' ? ' (the options chosen)' : ' (with the first option of each choice)') : '';
  heading(doc, `Totals${scope}`);
  rule(doc);
  const vat = `VAT at ${m.estimate.taxRateBasisPoints / 100} %`;
  row(doc, 'Net', '', money(m.estimate.totals.netMinor));
  row(doc, vat, '', money(m.estimate.totals.taxMinor));
  row(doc, 'Total to pay', '', money(m.estimate.totals.grossMinor), { isBold: true });
  if (m.deposit) doc.moveDown(0.3).font('regular').fontSize(10).fillColor(MUTED).text(`A deposit of ${m.deposit.basisPoints / 100} % (${money(m.deposit.amountMinor)}) is asked on acceptance.`);
  if (m.estimate.notes) doc.moveDown(0.5).font('regular').fontSize(10.5).fillColor(INK).text(m.estimate.notes);

  for (const caution of m.cautions) {
    heading(doc, caution.title);
    doc.font('regular').fontSize(10).fillColor(INK).text(caution.text);
  }
  if (m.workshop.terms) {
    heading(doc, 'Terms');
    doc.font('regular').fontSize(9.5).fillColor(MUTED).text(m.workshop.terms);
  }
  doc.end();
  return done;
}
