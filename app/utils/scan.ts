import jsQR from 'jsqr'
import { decodeAll } from '#shared/labels/multi-decode'

/** The text of the first QR code found in a frame of pixels, or null. */
export function decodeFrame(image: ImageData, thorough = false): string | null {
  return jsQR(image.data, image.width, image.height, { inversionAttempts: thorough ? 'attemptBoth' : 'dontInvert' })?.data ?? null
}

function pixels(source: CanvasImageSource, width: number, height: number, maxSide: number): ImageData {
  const scale = Math.min(1, maxSide / Math.max(width, height))
  const canvas = document.createElement('canvas')
  canvas.width = Math.max(1, Math.round(width * scale))
  canvas.height = Math.max(1, Math.round(height * scale))
  const ctx = canvas.getContext('2d', { willReadFrequently: true })!
  ctx.drawImage(source, 0, 0, canvas.width, canvas.height)
  return ctx.getImageData(0, 0, canvas.width, canvas.height)
}

/**
 * Reads a QR code from a photo. A phone photo is large and the label a small part of it, so
 * the decoder tries a few scales, smallest (fastest) first.
 */
export async function decodePhoto(file: Blob): Promise<string | null> {
  const bitmap = await createImageBitmap(file)
  try {
    for (const side of [1200, 2000, 800, 3000]) {
      const found = decodeFrame(pixels(bitmap, bitmap.width, bitmap.height, side), true)
      if (found) return found
    }
    return null
  } finally {
    bitmap.close()
  }
}

/**
 * Every QR code in a photo (a sheet of labels, several containers side by side), each once.
 * Falls back to the single-code reading at several scales when the tiled search finds none.
 */
export async function decodePhotoAll(file: Blob): Promise<string[]> {
  const bitmap = await createImageBitmap(file)
  try {
    const all = decodeAll(pixels(bitmap, bitmap.width, bitmap.height, 2000))
    if (all.length) return all
  } finally {
    bitmap.close()
  }
  const one = await decodePhoto(file)
  return one ? [one] : []
}

/** One frame of a playing video, scaled down for the decoder. */
export function videoFrame(video: HTMLVideoElement): ImageData | null {
  if (!video.videoWidth) return null
  return pixels(video, video.videoWidth, video.videoHeight, 720)
}
