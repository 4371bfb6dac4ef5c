import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { App, createAppController } from './app/shell/App.tsx';
import { ErrorBoundary } from './app/shell/ErrorBoundary.tsx';
import './app/shell/styles.css';

const root = document.getElementById('root');
if (!root) throw new Error('index.html has no #root element');
// Made outside React: a view that fails to draw is redrawn around the same open document.
const controller = createAppController();
createRoot(root, {
  // A view that fails is shown by the ErrorBoundary; a warning (not an error) keeps the details.
  onCaughtError: (error, info) => console.warn('Sectionsmith: a view failed to draw', error, info.componentStack),
}).render(
  <StrictMode>
    <ErrorBoundary>
      <App controller={controller} />
    </ErrorBoundary>
  </StrictMode>,
);
