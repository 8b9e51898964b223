// Converts the PDF fonts while the server starts, so the first certificate or label sheet does
// not wait for it. A failure here is logged and retried on the first PDF.
export default defineNitroPlugin(() => {
  usePdfFonts().catch((e) => console.error('Could not prepare the PDF fonts:', e instanceof Error ? e.message : e))
})
