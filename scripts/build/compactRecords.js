/**
 * A TypeScript transformer for the add-in build (webpack's ts-loader): an array literal of
 * plain object literals that all have the same keys in the same order (the data tables, the
 * spec parameter lists) is written as one key list and one tuple per record, rebuilt into
 * the same objects when the module loads:
 *
 *   [{ a: 1, b: 'x' }, { a: 2, b: 'y' }]   →   __records(['a', 'b'], [[1, 'x'], [2, 'y']])
 *
 * The records are plain objects with the same own properties, in the same order, with the
 * same values (each value expression is kept as written and evaluated in the same order),
 * so every reader sees the same data; only the repeated key names leave dist/functions.js.
 * Only arrays of at least MIN_RECORDS records of at least two keys are rewritten; a record
 * with a spread, a method, an accessor, a computed or a `__proto__` key leaves its array as
 * it is. test/build/compactRecords.test.ts checks that the data are unchanged.
 */
const ts = require('typescript');

const MIN_RECORDS = 3;
const HELPER = '__records';

/** The keys of a plain object literal, or null where it is not one. */
function plainKeys(node) {
  if (!ts.isObjectLiteralExpression(node)) return null;
  const keys = [];
  for (const p of node.properties) {
    if (ts.isPropertyAssignment(p) || ts.isShorthandPropertyAssignment(p)) {
      const name = p.name;
      let key;
      if (ts.isIdentifier(name)) key = name.text;
      else if (ts.isStringLiteral(name) && !ts.isShorthandPropertyAssignment(p)) key = name.text;
      else return null;
      if (key === '__proto__' || keys.includes(key)) return null;
      keys.push(key);
    } else {
      return null;
    }
  }
  return keys;
}

function valueOf(p, f) {
  return ts.isShorthandPropertyAssignment(p) ? f.createIdentifier(p.name.text) : p.initializer;
}

/** @param {ts.TransformationContext} context */
function compactRecords(context) {
  const f = context.factory;
  return (sourceFile) => {
    if (!/\.ts$/.test(sourceFile.fileName) || /\.d\.ts$/.test(sourceFile.fileName)) return sourceFile;
    let used = false;
    const visit = (node) => {
      const visited = ts.visitEachChild(node, visit, context);
      if (!ts.isArrayLiteralExpression(visited) || visited.elements.length < MIN_RECORDS) return visited;
      const first = plainKeys(visited.elements[0]);
      if (!first || first.length < 2) return visited;
      for (const el of visited.elements) {
        const keys = plainKeys(el);
        if (!keys || keys.length !== first.length || keys.some((k, i) => k !== first[i])) return visited;
      }
      used = true;
      return f.createCallExpression(f.createIdentifier(HELPER), undefined, [
        f.createArrayLiteralExpression(first.map((k) => f.createStringLiteral(k))),
        f.createArrayLiteralExpression(
          visited.elements.map((el) =>
            f.createArrayLiteralExpression(el.properties.map((p) => valueOf(p, f))),
          ),
        ),
      ]);
    };
    const out = ts.visitEachChild(sourceFile, visit, context);
    if (!used) return out;
    // function __records(keys, rows) { return rows.map((row) => { const o = {}; keys.forEach((k, i) => { o[k] = row[i]; }); return o; }); }
    const keys = f.createIdentifier('keys');
    const rows = f.createIdentifier('rows');
    const row = f.createIdentifier('row');
    const o = f.createIdentifier('o');
    const k = f.createIdentifier('k');
    const i = f.createIdentifier('i');
    const helper = f.createFunctionDeclaration(
      undefined,
      undefined,
      HELPER,
      undefined,
      [f.createParameterDeclaration(undefined, undefined, keys), f.createParameterDeclaration(undefined, undefined, rows)],
      undefined,
      f.createBlock([
        f.createReturnStatement(
          f.createCallExpression(f.createPropertyAccessExpression(rows, 'map'), undefined, [
            f.createArrowFunction(
              undefined,
              undefined,
              [f.createParameterDeclaration(undefined, undefined, row)],
              undefined,
              undefined,
              f.createBlock([
                f.createVariableStatement(
                  undefined,
                  f.createVariableDeclarationList(
                    [f.createVariableDeclaration(o, undefined, undefined, f.createObjectLiteralExpression([]))],
                    ts.NodeFlags.Const,
                  ),
                ),
                f.createExpressionStatement(
                  f.createCallExpression(f.createPropertyAccessExpression(keys, 'forEach'), undefined, [
                    f.createArrowFunction(
                      undefined,
                      undefined,
                      [f.createParameterDeclaration(undefined, undefined, k), f.createParameterDeclaration(undefined, undefined, i)],
                      undefined,
                      undefined,
                      f.createBlock([
                        f.createExpressionStatement(
                          f.createAssignment(f.createElementAccessExpression(o, k), f.createElementAccessExpression(row, i)),
                        ),
                      ]),
                    ),
                  ]),
                ),
                f.createReturnStatement(o),
              ]),
            ),
          ]),
        ),
      ]),
    );
    return f.updateSourceFile(out, [helper, ...out.statements]);
  };
}

module.exports = { compactRecords, MIN_RECORDS };
