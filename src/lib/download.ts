/** Saves text as a file through the browser's download, without a round trip to the server. */
export function downloadText(fileName: string, text: string, type = 'text/csv;charset=utf-8') {
  // A byte-order mark so spreadsheet programs read the file as UTF-8.
  const blob = new Blob(['\uFEFF', text], { type })
  const url = URL.createObjectURL(blob)
  const link = document.createElement('a')
  link.href = url
  link.download = fileName
  document.body.append(link)
  link.click()
  link.remove()
  setTimeout(() => URL.revokeObjectURL(url), 1000)
}
