/** Error boundary around the 3D canvas: a WebGL or shader failure shows a message, never a blank app. */
import { Component } from 'react'
import type { ErrorInfo, ReactNode } from 'react'

interface Props {
  readonly children: ReactNode
  /** Changing this key clears a caught error (e.g. a new model revision). */
  readonly resetKey?: unknown
}

interface State {
  readonly error: Error | null
  readonly key: unknown
}

export class ViewerErrorBoundary extends Component<Props, State> {
  override state: State = { error: null, key: this.props.resetKey }

  static getDerivedStateFromError(error: unknown): Partial<State> {
    return { error: error instanceof Error ? error : new Error(String(error)) }
  }

  static getDerivedStateFromProps(props: Props, state: State): Partial<State> | null {
    return props.resetKey !== state.key ? { key: props.resetKey, error: null } : null
  }

  override componentDidCatch(error: Error, info: ErrorInfo): void {
    console.error('[viewer] 3D view failed:', error.message, info.componentStack ?? '')
  }

  override render() {
    if (this.state.error) {
      return (
        <ViewerUnavailable
          reason={`The 3D view stopped: ${this.state.error.message}`}
        />
      )
    }
    return this.props.children
  }
}

/** The message shown instead of the canvas; the editor and result tables keep working. */
export function ViewerUnavailable(props: { reason: string }) {
  return (
    <div className="gyre-viewer-unavailable" role="status" data-testid="viewer-unavailable">
      <strong>[viewer] 3D view unavailable.</strong> {props.reason} The plan editor, the mode list and
      the result tables still work.
    </div>
  )
}

let webglCheck: string | null | undefined
let softwareRenderer = false

/** Whether the probe context reported a software rasterizer (SwiftShader, llvmpipe...). */
export function isSoftwareWebGL(): boolean {
  if (webglCheck === undefined) webglProblem()
  return softwareRenderer
}

/** Null when this browser can create a WebGL context, else the reason in words (checked once). */
export function webglProblem(): string | null {
  if (webglCheck !== undefined) return webglCheck
  try {
    const canvas = document.createElement('canvas')
    const gl = canvas.getContext('webgl2') ?? canvas.getContext('webgl')
    webglCheck = gl
      ? null
      : 'This browser could not create a WebGL context (WebGL is switched off or not supported here).'
    if (gl) {
      const info = gl.getExtension('WEBGL_debug_renderer_info')
      const name = String(gl.getParameter(info ? info.UNMASKED_RENDERER_WEBGL : gl.RENDERER) ?? '')
      softwareRenderer = /swiftshader|llvmpipe|softpipe|software/i.test(name)
    }
    const lose = gl?.getExtension('WEBGL_lose_context')
    lose?.loseContext()
  } catch (e) {
    webglCheck = `Creating a WebGL context failed: ${e instanceof Error ? e.message : String(e)}.`
  }
  return webglCheck
}
