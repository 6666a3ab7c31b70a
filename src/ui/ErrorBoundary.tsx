import { Component } from 'react'
import type { ErrorInfo, ReactNode } from 'react'

interface Props {
  /** Name of the panel, shown in the message and used in the test id. */
  readonly name: string
  readonly children: ReactNode
}

interface State {
  readonly error: Error | null
}

/**
 * Keeps a failing panel (a WebGL or rendering fault) from taking the rest of the screen, and the
 * drawing, down with it. The panel can be retried; the document is untouched either way.
 */
export class ErrorBoundary extends Component<Props, State> {
  override state: State = { error: null }

  static getDerivedStateFromError(error: Error): State {
    return { error }
  }

  override componentDidCatch(error: Error, info: ErrorInfo): void {
    console.warn(`[ui] ${this.props.name} failed:`, error.message, info.componentStack ?? '')
  }

  override render(): ReactNode {
    if (!this.state.error) return this.props.children
    return (
      <div className="panel-fault" role="alert" data-testid={`fault-${this.props.name}`}>
        <p>
          <strong>{this.props.name}</strong> could not be shown: {this.state.error.message}
        </p>
        <p>Your model is safe; the rest of the screen keeps working.</p>
        <button type="button" onClick={() => this.setState({ error: null })}>
          Try again
        </button>
      </div>
    )
  }
}
