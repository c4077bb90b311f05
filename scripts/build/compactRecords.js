/**
 * A TypeScript transformer for the add-in build (webpack's ts-loader): an array literal of
 * plain object literals whose keys follow one order (the data tables, the spec parameter
 * lists; a record may leave keys out) is written as one key list and one tuple per record,
 * a left-out key being a hole, rebuilt into the same objects when the module loads:
 *
 *   [{ a: 1, b: 'x' }, { a: 2 }, { a: 3, b: 'z' }]   →   __records(['a', 'b'], [[1, 'x'], [2], [3, 'z']])
 *
 * The records are plain objects with the same own properties, in the same order, with the
 * same values (each value expression is kept as written and evaluated in the same order),
 * so every reader sees the same data; only the repeated key names leave dist/functions.js.
 * Only arrays of at least MIN_RECORDS records with at least two keys in all are rewritten; a
 * record with a spread, a method, an accessor, a computed or a `__proto__` key, or records
 * that order their keys differently, leave their array as it is. test/build/compactRecords.test.ts checks that the data are unchanged.
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

/**
 * One key order that every record's keys follow (each record's keys in the same relative
 * order), or null where the records order their keys differently.
 */
function unionOfKeys(keyLists) {
  const union = [];
  for (const keys of keyLists) {
    let at = 0;
    for (const k of keys) {
      const i = union.indexOf(k);
      if (i === -1) union.splice(at++, 0, k);
      else if (i < at) return null;
      else at = i + 1;
    }
  }
  return union;
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
      const records = [];
      for (const el of visited.elements) {
        const keys = plainKeys(el);
        if (!keys) return visited;
        records.push({ el, keys });
      }
      const union = unionOfKeys(records.map((r) => r.keys));
      if (!union || union.length < 2) return visited;
      used = true;
      return f.createCallExpression(f.createIdentifier(HELPER), undefined, [
        f.createArrayLiteralExpression(union.map((k) => f.createStringLiteral(k))),
        f.createArrayLiteralExpression(
          records.map(({ el, keys }) => {
            const values = union.map((k) => {
              const p = el.properties[keys.indexOf(k)];
              return p ? valueOf(p, f) : f.createOmittedExpression();
            });
            while (values.length > 0 && ts.isOmittedExpression(values[values.length - 1])) values.pop();
            return f.createArrayLiteralExpression(values);
          }),
        ),
      ]);
    };
    const out = ts.visitEachChild(sourceFile, visit, context);
    if (!used) return out;
    // function __records(keys, rows) { return rows.map((row) => { const o = {}; keys.forEach((k, i) => { if (i in row) o[k] = row[i]; }); return o; }); }
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
                        f.createIfStatement(
                          f.createBinaryExpression(i, ts.SyntaxKind.InKeyword, row),
                          f.createExpressionStatement(
                            f.createAssignment(f.createElementAccessExpression(o, k), f.createElementAccessExpression(row, i)),
                          ),
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
