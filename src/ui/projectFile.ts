/** Reading and writing the project file at the browser edge. */
import { checkFileSizeBudget, checkTextBudget, parseProject, serializeProject } from '@/model'
import type { Project } from '@/model'
import { downloadBlob } from '@/viewer'

export type OpenResult =
  | { readonly ok: true; readonly project: Project; readonly warnings: readonly string[] }
  | { readonly ok: false; readonly errors: readonly string[] }

/** Parse file text into a validated project, or the readable list of what is wrong with it. */
export function readProjectText(text: string, fileName = 'file'): OpenResult {
  const tooLong = checkTextBudget(text.length)
  if (tooLong) return { ok: false, errors: [`[file] ${fileName}: ${tooLong}`] }
  let json: unknown
  try {
    json = JSON.parse(text)
  } catch (err) {
    const why = err instanceof Error ? err.message : String(err)
    return { ok: false, errors: [`[file] ${fileName} is not valid JSON (${why})`] }
  }
  try {
    const parsed = parseProject(json)
    if (parsed.ok) return { ok: true, project: parsed.project, warnings: parsed.warnings }
    return { ok: false, errors: parsed.errors.length ? parsed.errors : [`[file] ${fileName} was refused`] }
  } catch (err) {
    const why = err instanceof Error ? err.message : String(err)
    return { ok: false, errors: [why.startsWith('[') ? why : `[file] ${why}`] }
  }
}

/**
 * Open a chosen file: its byte size is checked against the input budget before a byte is read, so a
 * huge file is refused at once and never held in memory.
 */
export async function readProjectFile(file: {
  readonly name: string
  readonly size: number
  text(): Promise<string>
}): Promise<OpenResult> {
  const tooBig = checkFileSizeBudget(file.size)
  if (tooBig) return { ok: false, errors: [`[file] ${file.name}: ${tooBig}`] }
  return readProjectText(await file.text(), file.name)
}

/** The saved file's text: the document as it is (SI units), pretty-printed. */
export function projectToText(project: Project): string {
  return serializeProject(project)
}

/** A file name from the project name: lowercase, dashes, `.gyre.json`. */
export function projectFileName(project: Project): string {
  const slug = project.name
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
  return `${slug || 'project'}.gyre.json`
}

/** Start a download of the project as a .json file (Blob + temporary link). */
export function downloadProject(project: Project): string {
  const name = projectFileName(project)
  downloadBlob(new Blob([projectToText(project)], { type: 'application/json' }), name)
  return name
}
