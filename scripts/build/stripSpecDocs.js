/**
 * A TypeScript transformer for the add-in build (webpack's ts-loader): in the function specs
 * (src/functions/spec/ and src/functions/specs/), the documentation-only properties — summary,
 * returns, description, source, note, notes, defaultText, about — are emptied, and so are the
 * `examples` lists (for the docs, the formula bar's examples and the tests, which read the
 * sources), so that their text stays out of dist/functions.js. Excel's formula bar reads functions.json (generated from
 * the JSDoc of functions.ts), the docs are generated at development time, and nothing at run
 * time reads these properties; messages use the kinds' and parameters' `noun` and names, which
 * are kept. test/build/stripSpecDocs.test.ts checks what is kept and what is emptied.
 */
const ts = require('typescript');

/** Properties that only the docs and the formula-bar generator read. */
const DOC_KEYS = new Set(['summary', 'returns', 'description', 'source', 'note', 'notes', 'defaultText', 'about']);
/** Lists that only the docs, the formula-bar generator and the tests read: emptied whatever they hold. */
const DOC_LISTS = new Set(['examples']);
/** The spec sources. */
const SPEC_FILE = /[\\/]src[\\/]functions[\\/]specs?[\\/][^\\/]+\.ts$/;

function isText(node) {
  return ts.isStringLiteralLike(node) || ts.isTemplateExpression(node);
}

/** @param {ts.TransformationContext} context */
function stripSpecDocs(context) {
  const f = context.factory;
  return (sourceFile) => {
    if (!SPEC_FILE.test(sourceFile.fileName)) return sourceFile;
    const visit = (node) => {
      if (
        ts.isPropertyAssignment(node) &&
        ts.isIdentifier(node.name) &&
        (DOC_KEYS.has(node.name.text) || DOC_LISTS.has(node.name.text))
      ) {
        const init = node.initializer;
        if (DOC_LISTS.has(node.name.text)) return f.updatePropertyAssignment(node, node.name, f.createArrayLiteralExpression([]));
        if (isText(init)) return f.updatePropertyAssignment(node, node.name, f.createStringLiteral(''));
        if (ts.isArrayLiteralExpression(init) && init.elements.every(isText))
          return f.updatePropertyAssignment(node, node.name, f.createArrayLiteralExpression([]));
      }
      return ts.visitEachChild(node, visit, context);
    };
    return ts.visitNode(sourceFile, visit);
  };
}

module.exports = { stripSpecDocs, DOC_KEYS, DOC_LISTS, SPEC_FILE };
