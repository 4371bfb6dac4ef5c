// Preloaded with `node --import` by tests/check/cli-flags.test.ts: the first write to standard
// output throws a plain Error, the way a real defect inside a command would, so the test sees
// how the command line reports an internal error (exit 3, not 1).
process.stdout.write = () => {
  throw new Error('simulated defect: standard output refused the write');
};
