/** The only place the editor store meets React: a selector hook with shallow comparison for picks. */
import { useStore } from 'zustand'
import { useShallow } from 'zustand/react/shallow'
import type { EditorState, EditorStore } from '@/editor'

/** A slice of the editor state; re-renders only when the slice changes (Object.is). */
export function useEditor<T>(store: EditorStore, selector: (state: EditorState) => T): T {
  return useStore(store, selector)
}

/** An object or array pick of the editor state, compared shallowly. */
export function useEditorPick<T extends object>(store: EditorStore, selector: (state: EditorState) => T): T {
  return useStore(store, useShallow(selector))
}
