import { setLabTimeZone } from '#shared/format/datetime'

// Every date on every page is written in the lab's time zone, on the server and in the browser
// alike, so the two render the same text.
export default defineNuxtPlugin(() => {
  setLabTimeZone(String(useRuntimeConfig().public.labTimeZone ?? 'UTC'))
})
