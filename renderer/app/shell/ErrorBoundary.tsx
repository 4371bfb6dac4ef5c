/**
 * A rendering error in the editor's views must never take the user's work with it (issue 18
 * finding 1: a table header named "constructor" once blanked the whole editor). The document
 * lives in the app controller, made outside React (main.tsx), so this boundary only has to show
 * what went wrong and draw the views again: the document, its history and the recovery copy are
 * untouched.
 */
import { Component, type ReactNode } from 'react';

interface Props {
  readonly children: ReactNode;
}

interface State {
  readonly error: Error | null;
}

export class ErrorBoundary extends Component<Props, State> {
  override state: State = { error: null };

  static getDerivedStateFromError(error: unknown): State {
    return { error: error instanceof Error ? error : new Error(String(error)) };
  }

  override render(): ReactNode {
    const { error } = this.state;
    if (error === null) return this.props.children;
    return (
      <div className="view-error" role="alert" data-testid="view-error" style={{ padding: 24, maxWidth: 720 }}>
        <h2>A view could not be drawn</h2>
        <p>Your document is safe: it is still open, with its undo history and its recovery copy. Draw the views again to carry on; save a copy first if you like.</p>
        <p><code>{error.message}</code></p>
        <button type="button" data-testid="view-error-retry" onClick={() => this.setState({ error: null })}>Draw the views again</button>
      </div>
    );
  }
}
