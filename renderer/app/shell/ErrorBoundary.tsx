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
  /** The view this boundary guards (one panel), or none for the whole app. */
  readonly view?: string;
}

/**
 * Test hook: `?break-view=NAME` makes the view guarded as NAME throw while it renders, so the
 * browser tests can show that one failing view leaves the rest of the editor and the document.
 */
const BROKEN_VIEW = new URLSearchParams(globalThis.location?.search ?? '').get('break-view');

function BrokenOnPurpose({ view }: { readonly view: string }): null {
  throw new Error(`the ${view} view was made to fail (?break-view=${view}, a test hook)`);
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
    const { view } = this.props;
    if (error === null) {
      return view !== undefined && view === BROKEN_VIEW ? (
        <>
          <BrokenOnPurpose view={view} />
          {this.props.children}
        </>
      ) : (
        this.props.children
      );
    }
    return (
      <div className="view-error" role="alert" data-testid="view-error" data-view={view ?? 'app'} style={{ padding: view === undefined ? 24 : 8, maxWidth: 720 }}>
        <h2>{view === undefined ? 'A view could not be drawn' : `The ${view} view could not be drawn`}</h2>
        <p>Your document is safe: it is still open, with its undo history and its recovery copy. Draw the views again to carry on; save a copy first if you like.</p>
        <p><code>{error.message}</code></p>
        <button type="button" data-testid="view-error-retry" onClick={() => this.setState({ error: null })}>Draw the views again</button>
      </div>
    );
  }
}
