/**
 * Uploads one file as multipart/form-data (field "file") with XMLHttpRequest, because fetch
 * cannot report upload progress. `progress` runs from 0 to 1 while the bytes go out.
 */
export function useUpload() {
  const progress = ref<number | null>(null)
  const busy = ref(false)

  function upload<T>(url: string, file: File): Promise<T> {
    busy.value = true
    progress.value = 0
    return new Promise<T>((resolve, reject) => {
      const xhr = new XMLHttpRequest()
      xhr.open('POST', url)
      xhr.responseType = 'json'
      xhr.upload.onprogress = (e) => {
        if (e.lengthComputable) progress.value = e.loaded / e.total
      }
      xhr.onload = () => {
        busy.value = false
        if (xhr.status >= 200 && xhr.status < 300) {
          progress.value = 1
          resolve(xhr.response as T)
        } else {
          progress.value = null
          reject(new Error((xhr.response as { message?: string } | null)?.message ?? `The upload failed (${xhr.status})`))
        }
      }
      xhr.onerror = () => {
        busy.value = false
        progress.value = null
        reject(new Error('The connection broke off during the upload; nothing was saved'))
      }
      const body = new FormData()
      body.append('file', file, file.name)
      xhr.send(body)
    })
  }

  return { progress, busy, upload }
}
