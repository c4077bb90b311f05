/**
 * The runner's small promises: --version, at most 15 significant digits unless --full, and
 * hints that are commands which work as printed in a checkout.
 */
import { execFile } from 'node:child_process';
import * as fs from 'node:fs';
import * as path from 'node:path';
import { USAGE } from '../../src/cli/main';
import { ensureCliBuilt, ROOT, runMain, tempDir } from './helpers';

const version = (JSON.parse(fs.readFileSync(path.join(ROOT, 'package.json'), 'utf8')) as { version: string })
  .version;

describe('--version', () => {
  test.each([['--version'], ['-V'], ['version']])('%s prints the package version', async (flag) => {
    const r = await runMain([flag]);
    expect(r.code).toBe(0);
    expect(r.stdout).toBe(`potentia ${version}\n`);
  });
});

describe('eval prints at most 15 significant digits unless --full', () => {
  // 0.1 + 0.2 is 0.30000000000000004 in binary floating point (IEEE 754 double, by hand).
  test('0.1+0.2 prints 0.3', async () => {
    expect((await runMain(['eval', '=0.1+0.2'])).stdout).toBe('0.3\n');
    expect((await runMain(['eval', '--json', '=0.1+0.2'])).stdout).toBe('0.3\n');
  });

  test('--full prints every digit', async () => {
    expect((await runMain(['eval', '--full', '=0.1+0.2'])).stdout).toBe('0.30000000000000004\n');
  });

  test('-0.809 computed with float noise prints as -0.809', async () => {
    // -0.8089999999999999 is what 0.337 - 1.146 gives in doubles (by hand: IEEE 754).
    expect(0.337 - 1.146).toBe(-0.8089999999999999);
    expect((await runMain(['eval', '=0.337-1.146'])).stdout).toBe('-0.809\n');
  });

  test('a spill is rounded cell by cell', async () => {
    expect((await runMain(['eval', '={0.1+0.2,1/3}'])).stdout).toBe('0.3\t0.333333333333333\n');
  });
});

describe('hints are commands that work as printed', () => {
  const dir = tempDir('hints');
  afterAll(() => fs.rmSync(dir, { recursive: true, force: true }));

  test('every example and hint names the command as "npx potentia"', async () => {
    const demo = await runMain(['demo']);
    const texts = [USAGE, demo.stdout, (await runMain(['eval'])).stderr, (await runMain(['recalc'])).stderr];
    const mentions =
      texts.join('\n').match(/(?<!npx )(?<![\w-])potentia (?:eval|recalc|table|demo)\b/g) ?? [];
    expect(mentions).toEqual([]);
    expect(texts.join('\n')).toContain('npx potentia recalc');
  });

  test("the demo's closing hints run as printed (output name moved to a temporary folder)", async () => {
    const demo = await runMain(['demo']);
    const lines = demo.stdout
      .split('\n')
      .map((l) => l.replace(/^Next:/, '').trim())
      .filter((l) => l.startsWith('npx potentia '));
    expect(lines).toHaveLength(2);
    for (const line of lines) {
      // Split like a shell: single-quoted words kept whole.
      const words = (line.match(/'[^']*'|\S+/g) ?? []).map((w) => w.replace(/^'(.*)'$/, '$1')).slice(2);
      const o = words.indexOf('-o');
      if (o >= 0) words[o + 1] = path.join(dir, words[o + 1] as string);
      const r = await runMain(words);
      expect({ line, code: r.code, stderr: r.stderr }).toEqual({ line, code: 0, stderr: '' });
    }
  });

  test('"npx potentia" resolves to this checkout\'s runner (no install)', async () => {
    await ensureCliBuilt();
    const r = await new Promise<{ code: number; stdout: string }>((resolve) =>
      execFile('npx', ['--no-install', 'potentia', '--version'], { cwd: ROOT, timeout: 60000 }, (e, stdout) =>
        resolve({ code: e ? 1 : 0, stdout: String(stdout) }),
      ),
    );
    expect(r).toEqual({ code: 0, stdout: `potentia ${version}\n` });
  }, 90000);
});
