/**
 * One running instance of the desktop app per user (Electron's single-instance lock). A second
 * start hands its command line to the first instance (which opens the file it names, asking
 * before it replaces unsaved work) and quits at once, before it creates a window, a recovery copy
 * or any handler: so its exit can never clear the first instance's recovery copy. Written against
 * the few parts of Electron's `app` it uses, so it is tested under Node.
 */
export interface InstanceApp {
  requestSingleInstanceLock(): boolean;
  quit(): void;
  on(event: 'second-instance', listener: (event: unknown, argv: string[], workingDirectory: string) => void): unknown;
}

/** True when this is the first instance (go on starting); false when it has quit in favour of another. */
export function claimSingleInstance(app: InstanceApp, onSecondInstance: (argv: readonly string[], workingDirectory: string) => void): boolean {
  if (!app.requestSingleInstanceLock()) {
    app.quit();
    return false;
  }
  app.on('second-instance', (_event, argv, workingDirectory) => onSecondInstance(argv, workingDirectory));
  return true;
}
