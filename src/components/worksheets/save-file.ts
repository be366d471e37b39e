// Hands a Blob to the browser as a download with a file name.

/** Saves data as a file through a temporary link (revoked right after). */
export function saveFile(data: Blob, fileName: string): void {
  const url = URL.createObjectURL(data)
  const link = document.createElement('a')
  link.href = url
  link.download = fileName
  document.body.append(link)
  link.click()
  link.remove()
  setTimeout(() => URL.revokeObjectURL(url), 1000)
}
