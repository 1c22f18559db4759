// The acceptance summary as a PDF (pdfkit: a plain drawing API that streams pages, with
// TrueType embedding, no headless browser), in Public Sans from the font files the app
// ships. The station plans are drawn as vectors from the stored analysis.
import path from 'node:path';

import PDFDocument from 'pdfkit';

import { type DeliverySummary, photoLabel } from '../../shared/delivery-summary';

const FONT_DIR = path.dirname(require.resolve('@expo-google-fonts/public-sans/package.json'));
const REGULAR = path.join(FONT_DIR, '400Regular', 'PublicSans_400Regular.ttf');
const BOLD = path.join(FONT_DIR, '700Bold', 'PublicSans_700Bold.ttf');
const INK = '#1B2430';
const MUTED = '#636A77';
const ACCENT = '#B85227';

export type SummaryPhoto = { id: number; name: string; jpegOrPng: Buffer | null };

export function renderSummaryPdf(summary: DeliverySummary, photos: SummaryPhoto[]): Promise<Buffer> {
  // font: the regular face from the start, so the built-in Helvetica (WinAnsi only) is never used.
  const doc = new PDFDocument({ size: 'A4', margin: 48, font: REGULAR, info: { Title: `Capture summary ${summary.claimReference}` } });
  doc.registerFont('regular', REGULAR);
  doc.registerFont('bold', BOLD);
  const chunks: Buffer[] = [];
  doc.on('data', (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve) => doc.on('end', () => resolve(Buffer.concat(chunks))));
  const width = doc.page.width - 96;

  const heading = (text: string) => {
    if (doc.y > doc.page.height - 120) doc.addPage();
    doc.moveDown(0.8).font('bold').fontSize(13).fillColor(ACCENT).text(text).moveDown(0.2).font('regular').fontSize(10).fillColor(INK);
  };
  const fact = (label: string, value: string) => doc.font('bold').text(`${label}: `, { continued: true }).font('regular').text(value);
  const bullet = (text: string) => doc.text(`•  ${text}`, { indent: 8 });

  doc.font('bold').fontSize(18).fillColor(INK).text('Capture summary');
  doc
    .font('regular')
    .fontSize(10)
    .fillColor(MUTED)
    .text('Prepared by Sightline for the desk adjuster. Read only.')
    .fillColor(INK)
    .moveDown(0.6);
  fact('Claim reference', summary.claimReference);
  fact('Client', summary.client);
  if (summary.adjuster) fact('Desk adjuster', summary.adjuster);
  fact('Property', `${summary.property} (${summary.propertyType})`);
  fact('Loss', summary.loss);
  fact('Site visit', summary.siteVisit);
  fact('Technician', summary.technician);

  heading('Quality control');
  fact('Result', `Accepted, score ${summary.qc.score} (pass mark ${summary.qc.passMark})`);
  fact('Reviewed by', `${summary.qc.reviewer} on ${summary.qc.decidedOn}`);
  fact('Revisions submitted', String(summary.qc.revisions));

  heading('What this capture does not show');
  const boxTop = doc.y;
  doc.x += 8;
  for (const line of summary.notShown) doc.text(line, { width: width - 16 });
  doc.x -= 8;
  doc
    .rect(48, boxTop - 4, width, doc.y - boxTop + 8)
    .lineWidth(1.5)
    .strokeColor(ACCENT)
    .stroke();
  doc.moveDown(0.6);

  heading('Models delivered');
  if (!summary.models.length) doc.text('No model recorded.');
  for (const m of summary.models) bullet(`${m.structure}: ${m.reference}${m.split ? `. Separate model: ${m.split}` : ''}`);

  heading('Levels and rooms');
  for (const level of summary.levels) {
    doc.font('bold').text(`${level.level}: ${level.stations} stations`).font('regular');
    for (const r of level.rooms) bullet(`${r.name}: ${r.size}; ${r.stations} stations${r.doorway ? ', doorway station' : ''}`);
  }

  for (const plan of summary.plans) drawPlan(doc, plan, width);

  heading('Damage');
  if (!summary.damage.length) doc.text('No damage area recorded.');
  for (const d of summary.damage) {
    bullet(`${d.room}: ${d.description}. ${d.stations}.`);
    for (const p of d.photos) {
      const photo = photos.find((x) => x.id === p.id);
      if (photo?.jpegOrPng) {
        if (doc.y > doc.page.height - 220) doc.addPage();
        doc.image(photo.jpegOrPng, { fit: [220, 160] }).moveDown(0.2);
        doc.fillColor(MUTED).text(photoLabel(p)).fillColor(INK);
      } else
        doc
          .fillColor(MUTED)
          .text(`Photo ${photoLabel(p)}: open it on the shared page.`)
          .fillColor(INK);
    }
  }

  heading('Coverage gaps');
  if (!summary.gaps.length) doc.text('No coverage gap recorded.');
  for (const g of summary.gaps) bullet(`${g.location}: ${g.cause}. ${g.resolved ? 'Resolved' : 'Open'}${g.note ? `. ${g.note}` : ''}`);

  heading('Reflective surfaces');
  if (!summary.reflective.length) doc.text('None found.');
  for (const r of summary.reflective) bullet(`${r.room}: ${r.found} ${r.kind.toLowerCase()}(s) found, ${r.flagged} flagged`);

  heading('Safety hazards noted on site');
  if (!summary.hazards.length) doc.text('None noted.');
  for (const h of summary.hazards) bullet(h);

  doc.moveDown(1).fontSize(8).fillColor(MUTED).text(summary.footer, { width });
  doc.end();
  return done;
}

// A level's stations and registration links, scaled into a box: weak links dashed.
function drawPlan(doc: PDFKit.PDFDocument, plan: DeliverySummary['plans'][number], width: number) {
  if (plan.stations.length === 0) return;
  const height = 200;
  if (doc.y > doc.page.height - height - 80) doc.addPage();
  doc
    .moveDown(0.6)
    .font('bold')
    .fontSize(11)
    .fillColor(INK)
    .text(`Station plan: ${plan.level.replace('_', ' ')}`)
    .font('regular')
    .fontSize(10);
  const top = doc.y + 6;
  const xs = plan.stations.map((s) => s.x);
  const ys = plan.stations.map((s) => s.y);
  const [minX, maxX, minY, maxY] = [Math.min(...xs), Math.max(...xs), Math.min(...ys), Math.max(...ys)];
  const scale = Math.min((width - 20) / Math.max(maxX - minX, 1), (height - 20) / Math.max(maxY - minY, 1));
  const at = (s: { x: number; y: number }) => [48 + 10 + (s.x - minX) * scale, top + height - 10 - (s.y - minY) * scale] as const;
  const byNumber = new Map(plan.stations.map((s) => [s.number, s]));
  doc.rect(48, top, width, height).lineWidth(0.5).strokeColor(MUTED).stroke();
  for (const link of plan.links) {
    const a = byNumber.get(link.from);
    const b = byNumber.get(link.to);
    if (!a || !b) continue;
    const [x1, y1] = at(a);
    const [x2, y2] = at(b);
    doc
      .moveTo(x1, y1)
      .lineTo(x2, y2)
      .lineWidth(0.8)
      .strokeColor(link.weak ? ACCENT : MUTED);
    if (link.weak) doc.dash(3, { space: 2 });
    doc.stroke().undash();
  }
  for (const s of plan.stations) {
    const [x, y] = at(s);
    doc.circle(x, y, 2.2).fillColor(INK).fill();
  }
  doc
    .fillColor(MUTED)
    .fontSize(8)
    .text(
      'Dots are stations; lines join each station to the one it was registered from; dashed lines are longer than the spacing limit.',
      48,
      top + height + 4,
      { width },
    );
  doc.fillColor(INK).fontSize(10);
}
