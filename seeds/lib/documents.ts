// Small, real files for the demo's datasheets: a one-page PDF (standard Helvetica, nothing
// embedded) and CSV tables. Written by hand so the seed needs no PDF library.

function pdfText(s: string): string {
  // WinAnsi covers µ, ±, ², ³ and accented letters; anything beyond becomes "?".
  return s.replace(/[\u2013\u2014]/g, '-').replace(/[^\x20-\x7e\xa0-\xff]/g, '?').replace(/[\\()]/g, (c) => `\\${c}`)
}

/** A one-page A4 PDF with a bold title and lines of text. */
export function simplePdf(title: string, lines: string[]): Buffer {
  const body = [
    'BT /F2 15 Tf 56 780 Td (' + pdfText(title) + ') Tj ET',
    'BT /F1 10 Tf 56 750 Td 15 TL',
    ...lines.map((l) => `(${pdfText(l)}) Tj T*`),
    'ET',
  ].join('\n')
  const content = Buffer.from(body, 'latin1')
  const objects = [
    '<< /Type /Catalog /Pages 2 0 R >>',
    '<< /Type /Pages /Kids [3 0 R] /Count 1 >>',
    '<< /Type /Page /Parent 2 0 R /MediaBox [0 0 595 842] /Resources << /Font << /F1 4 0 R /F2 5 0 R >> >> /Contents 6 0 R >>',
    '<< /Type /Font /Subtype /Type1 /BaseFont /Helvetica /Encoding /WinAnsiEncoding >>',
    '<< /Type /Font /Subtype /Type1 /BaseFont /Helvetica-Bold /Encoding /WinAnsiEncoding >>',
  ]
  const parts: Buffer[] = [Buffer.from('%PDF-1.4\n%\xe2\xe3\xcf\xd3\n', 'latin1')]
  const offsets: number[] = []
  let length = parts[0]!.length
  const push = (b: Buffer) => {
    parts.push(b)
    length += b.length
  }
  objects.forEach((o, i) => {
    offsets.push(length)
    push(Buffer.from(`${i + 1} 0 obj\n${o}\nendobj\n`, 'latin1'))
  })
  offsets.push(length)
  push(Buffer.concat([Buffer.from(`6 0 obj\n<< /Length ${content.length} >>\nstream\n`, 'latin1'), content, Buffer.from('\nendstream\nendobj\n', 'latin1')]))
  const xref = length
  const table = ['xref', `0 ${offsets.length + 1}`, '0000000000 65535 f ', ...offsets.map((o) => `${String(o).padStart(10, '0')} 00000 n `)].join('\n')
  push(Buffer.from(`${table}\ntrailer\n<< /Size ${offsets.length + 1} /Root 1 0 R >>\nstartxref\n${xref}\n%%EOF\n`, 'latin1'))
  return Buffer.concat(parts)
}

/** A CSV file from a header and rows (values here never hold commas or quotes). */
export function simpleCsv(header: string[], rows: (string | number)[][]): Buffer {
  return Buffer.from([header, ...rows].map((r) => r.join(',')).join('\n') + '\n', 'utf8')
}
