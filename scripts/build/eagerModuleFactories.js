/**
 * A webpack plugin for the add-in build: in the minified functions bundle, each module factory
 * of the modules object (`var e={854(e,t,n){…},696(e,t,n){…}}`, written by webpack as methods)
 * is rewritten as a parenthesised function expression (`854:(function(e,t,n){…})`).
 *
 * Why: every factory runs while the bundle loads, but V8 compiles a method lazily: it pre-parses
 * the factory's whole text with the script, then parses it again when it is first called. A
 * function expression in parentheses is compiled with the script (V8's heuristic for functions
 * that are about to be called), so each factory's text is read once. The minifier drops such
 * parentheses, so this runs after it. Same code otherwise: the factories are called as methods
 * of the modules object (`e[id](module, exports, require)`) and use neither `super` nor
 * `new.target`, so a function expression behaves alike. test/build/eagerModuleFactories.test.ts
 * checks the rewrite; a bundle of another shape is left as it is.
 */
const acorn = require('acorn');

/** The modules object of a webpack bundle's bootstrap IIFE, or null where there is none. */
function modulesObject(program) {
  const first = program.body[0];
  if (!first || first.type !== 'ExpressionStatement') return null;
  let call = first.expression;
  if (call.type === 'UnaryExpression') call = call.argument;
  if (call.type !== 'CallExpression') return null;
  const fn = call.callee;
  if ((fn.type !== 'ArrowFunctionExpression' && fn.type !== 'FunctionExpression') || fn.body.type !== 'BlockStatement')
    return null;
  for (const s of fn.body.body) {
    if (s.type !== 'VariableDeclaration' || s.declarations.length === 0) continue;
    const init = s.declarations[0].init;
    if (!init || init.type !== 'ObjectExpression' || init.properties.length === 0) continue;
    const factories = init.properties.every(
      (p) =>
        p.type === 'Property' &&
        !p.computed &&
        p.kind === 'init' &&
        p.key.type === 'Literal' &&
        typeof p.key.value === 'number' &&
        p.value.type === 'FunctionExpression' &&
        !p.value.async &&
        !p.value.generator,
    );
    return factories ? init : null;
  }
  return null;
}

/**
 * The bundle's code with each module factory a parenthesised function expression, and how many
 * were rewritten (0, and the code as it is, where the bundle has no modules object of that shape).
 *
 * @param {string} code a webpack bundle (minified or not)
 * @returns {{ code: string, factories: number }}
 */
function eagerModuleFactories(code) {
  const program = acorn.parse(code, { ecmaVersion: 'latest', sourceType: 'script' });
  const modules = modulesObject(program);
  if (!modules) return { code, factories: 0 };
  let out = '';
  let pos = 0;
  let factories = 0;
  for (const p of modules.properties) {
    const v = p.value;
    // a method's value starts at its parameter list; a property's value at `function`
    const fn = p.method ? `function${code.slice(v.start, v.end)}` : code.slice(v.start, v.end);
    if (!p.method && code.charCodeAt(v.start - 1) === 40 /* ( */) continue;
    out += `${code.slice(pos, p.start)}${code.slice(p.key.start, p.key.end)}:(${fn})`;
    pos = p.end;
    factories++;
  }
  return { code: out + code.slice(pos), factories };
}

/** Applies {@link eagerModuleFactories} to the named JavaScript assets, after minification. */
class EagerModuleFactoriesPlugin {
  constructor(assetNames) {
    this.assetNames = assetNames;
  }
  apply(compiler) {
    const { Compilation, sources } = compiler.webpack;
    compiler.hooks.thisCompilation.tap('EagerModuleFactoriesPlugin', (compilation) => {
      compilation.hooks.processAssets.tap(
        { name: 'EagerModuleFactoriesPlugin', stage: Compilation.PROCESS_ASSETS_STAGE_OPTIMIZE_INLINE },
        () => {
          for (const name of this.assetNames) {
            const asset = compilation.getAsset(name);
            if (!asset) continue;
            const { code, factories } = eagerModuleFactories(asset.source.source().toString());
            if (factories > 0) compilation.updateAsset(name, new sources.RawSource(code));
          }
        },
      );
    });
  }
}

module.exports = { eagerModuleFactories, EagerModuleFactoriesPlugin };
