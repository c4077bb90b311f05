/**
 * Where the package's own files are, whether the runner runs from its TypeScript sources
 * (tests, ts-jest) or from the compiled output in build/cli (the `potentia` command).
 */
import * as fs from 'node:fs';
import * as path from 'node:path';

/** The folder of the package.json named "potentia" at or above `from`. */
export function packageRoot(from: string = __dirname): string {
  let dir = path.resolve(from);
  for (;;) {
    const manifest = path.join(dir, 'package.json');
    if (fs.existsSync(manifest)) {
      try {
        const name = (JSON.parse(fs.readFileSync(manifest, 'utf8')) as { name?: unknown }).name;
        if (name === 'potentia') return dir;
      } catch {
        // An unreadable package.json is not ours: keep looking above it.
      }
    }
    const parent = path.dirname(dir);
    if (parent === dir) return path.resolve(__dirname, '..', '..');
    dir = parent;
  }
}

/** The package's version, as package.json gives it. */
export function packageVersion(): string {
  const manifest = path.join(packageRoot(), 'package.json');
  const version = (JSON.parse(fs.readFileSync(manifest, 'utf8')) as { version?: unknown }).version;
  return typeof version === 'string' ? version : 'unknown';
}
