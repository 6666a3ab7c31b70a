/** File names for exported reports and tables (no path, safe on every common file system). */
import type { Project } from '@/model'
import type { ResultTable } from './tables'

/** A file-name-safe slug of a project name: lower case ASCII letters, digits and dashes. */
export function fileSlug(name: string): string {
  const slug = name
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 60)
    .replace(/-+$/g, '')
  return slug === '' ? 'gyre-project' : slug
}

/** File name of a table's CSV, e.g. 'corner-block-quarry-street-modes.csv'. */
export function csvFileName(project: Pick<Project, 'name'>, table: Pick<ResultTable, 'id'>): string {
  return `${fileSlug(project.name)}-${fileSlug(table.id)}.csv`
}

/** File name of the printable report, e.g. 'corner-block-quarry-street-report.html'. */
export function reportFileName(project: Pick<Project, 'name'>): string {
  return `${fileSlug(project.name)}-report.html`
}
