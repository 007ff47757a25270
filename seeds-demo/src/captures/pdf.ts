/** Text for a PDF string literal: the delimiters escaped, anything outside ASCII replaced. */
function pdfString(text: string): string {
  return text
    .replace(/[‘’]/g, "'")
    .replace(/[“”]/g, '"')
    .replace(/[–—]/g, '-')
    .replace(/[^\x20-\x7e]/g, '?')
    .replace(/([\\()])/g, '\\$1');
}

export interface PdfLine {
  text: string;
  /** Font size in points; 11 unless given. */
  size?: number;
  bold?: boolean;
}

/**
 * A one-page A4 PDF (ISO 32000-1) with lines of text in the standard Helvetica fonts,
 * written by hand: five objects and a cross-reference table with exact byte offsets.
 */
export function onePagePdf(title: string, lines: readonly PdfLine[]): Buffer {
  let y = 790;
  const content = lines
    .map((line) => {
      const size = line.size ?? 11;
      y -= Math.round(size * 1.5);
      return `BT /${line.bold ? 'F2' : 'F1'} ${size} Tf 56 ${y} Td (${pdfString(line.text)}) Tj ET`;
    })
    .join('\n');
  const objects = [
    '<< /Type /Catalog /Pages 2 0 R >>',
    '<< /Type /Pages /Kids [3 0 R] /Count 1 >>',
    '<< /Type /Page /Parent 2 0 R /MediaBox [0 0 595 842] /Contents 4 0 R ' +
      '/Resources << /Font << /F1 5 0 R /F2 6 0 R >> >> >>',
    `<< /Length ${Buffer.byteLength(content, 'latin1')} >>\nstream\n${content}\nendstream`,
    '<< /Type /Font /Subtype /Type1 /BaseFont /Helvetica >>',
    '<< /Type /Font /Subtype /Type1 /BaseFont /Helvetica-Bold >>',
    `<< /Title (${pdfString(title)}) /Producer (Skyledger demo seed) >>`,
  ];
  let body = '%PDF-1.4\n';
  const offsets = objects.map((object, index) => {
    const offset = Buffer.byteLength(body, 'latin1');
    body += `${index + 1} 0 obj\n${object}\nendobj\n`;
    return offset;
  });
  const xref = Buffer.byteLength(body, 'latin1');
  body +=
    `xref\n0 ${objects.length + 1}\n0000000000 65535 f \n` +
    offsets.map((offset) => `${String(offset).padStart(10, '0')} 00000 n \n`).join('') +
    `trailer\n<< /Size ${objects.length + 1} /Root 1 0 R /Info ${objects.length} 0 R >>\n` +
    `startxref\n${xref}\n%%EOF\n`;
  return Buffer.from(body, 'latin1');
}
