// Preloaded with `node --import` by tests/check/cli-flags.test.ts: a defect thrown outside the
// command, asynchronously, once the launcher is running (its first process listener is the
// sign); Node alone would exit 1 for it.
const on = process.on.bind(process);
let armed = false;
process.on = (event, listener) => {
  if (!armed && event === 'uncaughtException') {
    armed = true;
    setTimeout(() => {
      throw new Error('simulated late defect outside the command');
    }, 0);
  }
  return on(event, listener);
};
