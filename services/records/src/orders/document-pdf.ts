import PDFDocument from 'pdfkit';
import { formatCents } from './mail-notices.js';

export interface PdfLine {
  description: string;
  quantity: number;
  amountCents: number;
}

export interface PdfDocumentData {
  title: string;
  shop: string;
  customerName: string;
  facts: [string, string][];
  currency: string;
  lines: PdfLine[];
  totals: [string, number][];
  footer?: string;
}

/** One plain A-size page layout shared by quotes and invoices; pdfkit's built-in Helvetica, no fonts to ship. */
export function renderPdf(data: PdfDocumentData): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    const doc = new PDFDocument({ size: 'LETTER', margin: 54, info: { Title: data.title, Author: data.shop } });
    const chunks: Buffer[] = [];
    doc.on('data', (c: Buffer) => chunks.push(c));
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
    const money = (c: number) => formatCents(c, data.currency);
    const right = 558;
    doc.font('Helvetica-Bold').fontSize(16).text(data.shop);
    doc.moveDown(0.5).fontSize(13).text(data.title);
    doc.font('Helvetica').fontSize(10).moveDown(0.5).text(`For: ${data.customerName}`);
    for (const [label, value] of data.facts) doc.text(`${label}: ${value}`);
    doc.moveDown();
    const row = (left: string, qty: string, amount: string, bold = false) => {
      const y = doc.y;
      doc.font(bold ? 'Helvetica-Bold' : 'Helvetica');
      doc.text(left, 54, y, { width: 360 });
      const after = doc.y;
      doc.text(qty, 420, y, { width: 40, align: 'right' });
      doc.text(amount, 470, y, { width: right - 470, align: 'right' });
      doc.y = Math.max(after, doc.y);
      doc.moveDown(0.2);
    };
    row('Item', 'Qty', 'Amount', true);
    for (const l of data.lines) row(l.description, String(l.quantity), money(l.amountCents));
    doc.moveDown(0.5);
    for (const [label, cents] of data.totals) row(label, '', money(cents), label === 'Total' || label === 'Balance due');
    if (data.footer) doc.moveDown().font('Helvetica').text(data.footer, 54);
    doc.end();
  });
}
