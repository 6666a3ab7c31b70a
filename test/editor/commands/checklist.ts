/**
 * The command checklist every command test runs (STYLE.md §7): do -> undo restores the document
 * exactly -> redo re-applies it; cancel mid-interaction (mark, execute, bail) leaves nothing to redo;
 * a refusal leaves the document, revision and history untouched.
 */
import { expect } from 'vitest'
import type { CommandArgs, CommandName, EditorStore } from '@/editor'
import { bail, execute, hasRedo, mark, redo, undo } from '@/editor'
import type { Project } from '@/model'

/** Run a command inside a gesture and check do/undo/redo; returns the document after the command. */
export function checkDoUndoRedo<N extends CommandName>(
  store: EditorStore,
  name: N,
  args: CommandArgs<N>,
  assertDone: (doc: Project, before: Project) => void,
): Project {
  const before = store.getState().doc
  const snapshot = structuredClone(before)
  const revision = store.getState().revision
  mark(store, name)
  const result = execute(store, name, args)
  expect(result.ok ? 'ok' : result.message).toBe('ok')
  const after = store.getState().doc
  expect(after).not.toBe(before)
  expect(store.getState().revision).toBe(revision + 1)
  assertDone(after, before)
  // Commands never mutate their input.
  expect(before).toEqual(snapshot)
  const afterSnapshot = structuredClone(after)

  expect(undo(store)).toBe(true)
  const restored = store.getState().doc
  expect(restored).toEqual(snapshot)
  // Undo puts back the very records, not look-alikes.
  for (const kind of ['walls', 'frameLines', 'columns', 'slabs', 'lineMasses', 'pointMasses', 'materials'] as const) {
    for (const id of Object.keys(before[kind])) expect(restored[kind][id]).toBe(before[kind][id])
  }
  expect(store.getState().revision).toBe(revision + 2)

  expect(redo(store)).toBe(true)
  expect(store.getState().doc).toEqual(afterSnapshot)
  expect(store.getState().revision).toBe(revision + 3)
  return store.getState().doc
}

/** Mark, run, bail: the document is as before and the redo stack is empty. */
export function checkCancel<N extends CommandName>(store: EditorStore, name: N, args: CommandArgs<N>): void {
  const snapshot = structuredClone(store.getState().doc)
  const id = mark(store, name)
  const result = execute(store, name, args)
  expect(result.ok ? 'ok' : result.message).toBe('ok')
  bail(store, id)
  expect(store.getState().doc).toEqual(snapshot)
  expect(hasRedo(store.getState().history)).toBe(false)
  expect(undo(store)).toBe(false)
}

/** The command is refused with a message containing `message`; nothing changes. */
export function checkRefused<N extends CommandName>(
  store: EditorStore,
  name: N,
  args: CommandArgs<N>,
  message: string,
): void {
  const { doc, revision, history } = store.getState()
  const result = execute(store, name, args)
  expect(result.ok).toBe(false)
  if (!result.ok) expect(result.message).toContain(message)
  expect(store.getState().doc).toBe(doc)
  expect(store.getState().revision).toBe(revision)
  expect(store.getState().history).toBe(history)
  expect(store.getState().message).toContain(message)
}
