/**
 * Browser side of the report buttons: save text as a file through a Blob link, and open HTML in a
 * new window (or, when pop-ups are blocked, a hidden frame) to print it.
 */
import { downloadBlob } from '@/viewer'
import type { SavedFile } from './reportFiles'

/** Save one text or binary file through a temporary object URL and an <a download> click. */
export function downloadFile(file: SavedFile): void {
  const body: BlobPart = 'text' in file ? file.text : (file.bytes as Uint8Array<ArrayBuffer>)
  downloadBlob(new Blob([body], { type: file.mime }), file.fileName)
}

/**
 * Open the report in a new window and start printing; if the window is blocked, print from a
 * hidden iframe instead. Returns where it went.
 */
export function openAndPrint(html: string, win: Window = window): 'window' | 'frame' {
  const opened = win.open('', '_blank')
  if (opened) {
    opened.document.open()
    opened.document.write(html)
    opened.document.close()
    opened.focus()
    // Give the new document a moment to lay out before the print dialog freezes it.
    opened.setTimeout(() => opened.print(), 250)
    return 'window'
  }
  const frame = win.document.createElement('iframe')
  frame.setAttribute('aria-hidden', 'true')
  frame.style.position = 'fixed'
  frame.style.width = '0'
  frame.style.height = '0'
  frame.style.border = '0'
  frame.onload = () => {
    frame.contentWindow?.focus()
    frame.contentWindow?.print()
    setTimeout(() => frame.remove(), 60_000)
  }
  frame.srcdoc = html
  win.document.body.appendChild(frame)
  return 'frame'
}
