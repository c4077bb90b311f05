/**
 * Prints the README's "Error catalogue" section (Markdown, formatted with the project's
 * Prettier settings) from the bad-input test table, test/hardening/badInputCases.ts. Put it
 * in place of the section in README.md; test/hardening/badInputs.test.ts fails while the
 * README and the table disagree.
 *
 *   npx ts-node --transpile-only scripts/error-catalogue.ts
 */
import * as path from 'path';
import * as prettier from 'prettier';
import { errorCatalogueMarkdown } from '../test/hardening/badInputCases';

async function main(): Promise<void> {
  const readme = path.resolve(__dirname, '..', 'README.md');
  const options = (await prettier.resolveConfig(readme)) ?? {};
  const text = await prettier.format(errorCatalogueMarkdown(), { ...options, parser: 'markdown' });
  process.stdout.write(text);
}

main().catch((e: unknown) => {
  console.error(e);
  process.exit(1);
});
