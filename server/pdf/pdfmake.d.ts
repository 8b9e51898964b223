// pdfmake 0.3 ships no type declarations (and @types/pdfmake describes 0.2): the small part
// of its server-side API that Ionfolio uses.
declare module 'pdfmake' {
  interface FontFiles {
    normal: string
    bold: string
    italics: string
    bolditalics: string
  }
  interface OutputDocument {
    getBuffer(): Promise<Buffer>
  }
  interface PdfMake {
    virtualfs: { writeFileSync(name: string, content: Buffer): void; existsSync(name: string): boolean }
    setFonts(fonts: Record<string, FontFiles>): void
    setUrlAccessPolicy(policy: (url: string) => boolean): void
    setLocalAccessPolicy(policy: (path: string) => boolean): void
    createPdf(doc: Record<string, unknown>, options?: Record<string, unknown>): OutputDocument
  }
  const pdfmake: PdfMake
  export default pdfmake
}
