// electron-builder hook (package.json "build.beforePack"): `npm run dist` packs what
// electron/build.mjs builds, so build first. CommonJS because electron-builder require()s hooks.
module.exports = async function beforePack() {
  const { buildDesktop } = await import('./build.mjs');
  await buildDesktop();
};
