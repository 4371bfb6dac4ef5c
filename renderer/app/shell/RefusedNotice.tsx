/**
 * Over the results after a file was refused (hardening finding 8): the numbers shown are still
 * those of the document that stayed open, not the refused file's. Shown until that document
 * changes (an edit, or another file opened); the controller keeps the state.
 */
import type { ReactElement } from 'react';

export function RefusedNotice({ refused }: { readonly refused: { readonly file: string; readonly shown: string } | null }): ReactElement | null {
  if (refused === null) return null;
  return (
    <p className="banner error small" role="status" data-testid="results-refused">
      {refused.file} was not opened. The results below are still those of {refused.shown}, which stays open unchanged.
    </p>
  );
}
