/**
 * The "?" sheet: every keyboard shortcut (from the action table and the layouts) and the key to the
 * plan symbols, in one place. Escape, "?" or the Close button closes it.
 */
import { ACTIONS } from './actions'
import { PlanKey } from './PlanKey'
import { LAYOUTS } from './workbench/layouts'

const EXTRA_KEYS: readonly (readonly [string, string])[] = [
  ['Digits, @ or < while drawing', 'go to the length, angle box ("6, 0" or "@6<90"); Enter applies'],
  ['Enter', 'finish a slab, opening or line mass'],
  ['Backspace', 'drop the last corner while drawing'],
  ['Alt (held)', 'place a point without snapping'],
  ['Shift (held)', 'keep the angle to 15° steps; add to the selection'],
  ['Wheel / middle drag / Space + drag', 'zoom / pan the plan'],
  ['Ctrl+Z in a box', 'applies the box, then undoes the last change'],
  ['?', 'this sheet'],
]

export function ShortcutSheet({ onClose }: { onClose: () => void }) {
  return (
    <div className="sheet-backdrop" data-testid="shortcut-sheet" role="dialog" aria-modal="true" aria-label="Shortcuts and plan symbols" onClick={onClose}>
      <div className="sheet" onClick={(e) => e.stopPropagation()}>
        <header>
          <h2>Shortcuts and plan symbols</h2>
          <button type="button" data-testid="shortcut-sheet-close" onClick={onClose} autoFocus>
            Close
          </button>
        </header>
        <div className="sheet-columns">
          <table className="data compact">
            <caption>Keys</caption>
            <tbody>
              {ACTIONS.filter((a) => a.shortcut).map((a) => (
                <tr key={a.id}>
                  <td>
                    <kbd>{a.shortcut}</kbd>
                  </td>
                  <td>{a.label}</td>
                </tr>
              ))}
              {LAYOUTS.map((l) => (
                <tr key={l.id}>
                  <td>
                    <kbd>{l.key}</kbd>
                  </td>
                  <td>Layout: {l.label}</td>
                </tr>
              ))}
              {EXTRA_KEYS.map(([k, what]) => (
                <tr key={k}>
                  <td>
                    <kbd>{k}</kbd>
                  </td>
                  <td>{what}</td>
                </tr>
              ))}
            </tbody>
          </table>
          <div>
            <h3>Plan symbols</h3>
            <PlanKey />
          </div>
        </div>
      </div>
    </div>
  )
}
