import PDFDocument from 'pdfkit';
import { readLogo } from '../brand/logo';
import type { Figure } from './figures';
import type { ReportCalculation, ReportModel, Row } from './model';

type Doc = PDFKit.PDFDocument;
export type PaperSize = 'A4' | 'LETTER';

/** The built-in PDF fonts speak WinAnsi only; swap the few other characters we print. */
const pdfText = (s: string): string =>
  s.replace(/\u2212/g, '-').replace(/[\u2009\u202f]/g, ' ').replace(/[^\x20-\x7e\u00a0-\u00ff\u2013\u2014\u2018-\u201d\u2022\u2026\n]/g, '?');

function drawFigure(doc: Doc, f: Figure, x0: number, y0: number, scale: number): void {
  const X = (x: number): number => x0 + x * scale;
  const Y = (y: number): number => y0 + y * scale;
  doc.save().rect(x0, y0, f.w * scale, f.h * scale).lineWidth(0.5).stroke('#c9d1d6').restore();
  for (const s of f.shapes) {
    doc.save();
    if (s.kind === 'line') {
      if (s.dash) doc.dash(3, { space: 2 });
      doc.moveTo(X(s.x1), Y(s.y1)).lineTo(X(s.x2), Y(s.y2)).lineWidth(s.width * scale).stroke(s.colour);
    } else if (s.kind === 'rect') {
      doc.rect(X(s.x), Y(s.y), s.w * scale, s.h * scale).fill(s.fill);
    } else if (s.kind === 'poly' && s.points.length > 1) {
      doc.moveTo(X(s.points[0][0]), Y(s.points[0][1]));
      for (const [px, py] of s.points.slice(1)) doc.lineTo(X(px), Y(py));
      doc.lineWidth(s.width * scale).lineJoin('round').stroke(s.colour);
    } else if (s.kind === 'text') {
      const size = s.size * scale;
      doc.font('Helvetica').fontSize(size).fillColor(s.colour);
      const w = doc.widthOfString(pdfText(s.text));
      doc.text(pdfText(s.text), s.anchor === 'end' ? X(s.x) - w : X(s.x), Y(s.y) - size * 0.8, { lineBreak: false });
    }
    doc.restore();
  }
}

function rows(doc: Doc, heading: string, list: Row[], colour: string): void {
  doc.moveDown(0.6).font('Helvetica-Bold').fontSize(11).fillColor(colour).text(heading);
  doc.font('Helvetica').fontSize(9).fillColor('#14212b');
  for (const r of list) doc.text(`${pdfText(r.label)}: ${pdfText(r.value)}`, { indent: 8 });
}

function calcPage(doc: Doc, m: ReportModel, c: ReportCalculation): void {
  const { primaryColour } = m.brand;
  doc.font('Helvetica-Bold').fontSize(15).fillColor(primaryColour).text(pdfText(c.title));
  doc.font('Helvetica').fontSize(9).fillColor('#5b6b77').text(`${c.tool} - calculation ${c.id} - engine ${c.engineVersion}`);
  rows(doc, 'Results', c.results, primaryColour);
  if (c.warnings.length) rows(doc, 'Warnings', c.warnings.map((w) => ({ label: '!', value: w })), primaryColour);
  for (const f of c.figures) {
    const scale = 0.9;
    if (doc.y + f.h * scale + 30 > doc.page.height - doc.page.margins.bottom) doc.addPage();
    doc.moveDown(0.5).font('Helvetica-Bold').fontSize(10).fillColor(primaryColour).text(pdfText(f.title));
    const y0 = doc.y + 4;
    drawFigure(doc, f, doc.page.margins.left, y0, scale);
    doc.y = y0 + f.h * scale + 8;
    doc.x = doc.page.margins.left;
  }
  rows(doc, 'Inputs', c.inputs, primaryColour);
  doc.moveDown(0.6).font('Helvetica-Bold').fontSize(11).fillColor(primaryColour).text('Cautions');
  for (const k of c.cautions) {
    doc.font('Helvetica-Bold').fontSize(9).fillColor('#14212b').text(pdfText(k.title), { continued: true });
    doc.font('Helvetica').text(`  ${pdfText(k.text)}`);
  }
}

function coverPage(doc: Doc, m: ReportModel): void {
  const { brand, job } = m;
  const logo = brand.logoFile ? readLogo(brand.logoFile) : null;
  if (logo) doc.image(logo, { fit: [180, 70] }).moveDown(0.5);
  doc.font('Helvetica-Bold').fontSize(20).fillColor(brand.primaryColour).text(pdfText(brand.companyName));
  doc.font('Helvetica').fontSize(9).fillColor('#14212b');
  if (brand.licenceNumber) doc.text(`Licence / registration: ${pdfText(brand.licenceNumber)}`);
  if (brand.contactBlock) doc.text(pdfText(brand.contactBlock));
  doc.moveDown(1.2).font('Helvetica-Bold').fontSize(16).fillColor(brand.primaryColour).text(pdfText(job.title));
  doc.font('Helvetica').fontSize(10).fillColor('#14212b');
  doc.text(`Client: ${pdfText(job.client)}`).text(`Site: ${pdfText(job.siteAddress)}`).text(`Job: ${job.id}`);
  doc.text(`Prepared ${m.generatedAt.toISOString().slice(0, 10)}`);
  if (job.notes) doc.moveDown(0.5).text(pdfText(job.notes));
  rows(doc, 'Method and assumptions', m.assumptions.map((a) => ({ label: '-', value: a })), brand.primaryColour);
  doc.moveDown(0.6).font('Helvetica-Bold').fontSize(11).fillColor(brand.primaryColour).text('Disclaimer');
  doc.font('Helvetica').fontSize(9).fillColor('#14212b').text(pdfText(m.disclaimer));
}

/** Stamp each page's foot: the footer text, the calculation id shown there, and page numbers. */
function stampPages(doc: Doc, m: ReportModel, idOnPage: string[]): void {
  const range = doc.bufferedPageRange();
  for (let i = 0; i < range.count; i++) {
    doc.switchToPage(range.start + i);
    const bottom = doc.page.height - 36;
    const foot = `${pdfText(m.brand.reportFooter || m.brand.companyName)}  |  ${idOnPage[i] ?? `job ${m.job.id}`}  |  page ${i + 1} of ${range.count}`;
    doc.page.margins.bottom = 0;
    doc.font('Helvetica').fontSize(7.5).fillColor('#5b6b77').text(foot, 50, bottom, { width: doc.page.width - 100, lineBreak: false });
  }
}

/** The report as a PDF (vectors for every figure), A4 or US Letter. */
export function reportPdf(m: ReportModel, size: PaperSize = 'A4'): Promise<Buffer> {
  const doc = new PDFDocument({ size, margin: 50, bufferPages: true, info: { Title: pdfText(`${m.job.title} - ${m.brand.companyName}`), Author: pdfText(m.brand.companyName) } });
  const chunks: Buffer[] = [];
  doc.on('data', (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  const idOnPage: string[] = [];
  let current = `job ${m.job.id}`;
  doc.on('pageAdded', () => idOnPage.push(current));
  idOnPage.push(current);
  coverPage(doc, m);
  for (const c of m.calculations) {
    current = `calculation ${c.id}`;
    doc.addPage();
    calcPage(doc, m, c);
  }
  stampPages(doc, m, idOnPage);
  doc.end();
  return done;
}
