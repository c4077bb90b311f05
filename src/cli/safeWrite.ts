/**
 * Writing an output file so that nothing is ever lost: the new file is written in full to a
 * temporary file in the output's folder and then put in place in one step (a rename, or a
 * hard link for a new file), so an interrupted or failed run leaves the previous output
 * byte-identical. The output is never a symbolic link (its target is never written), never
 * the input by identity (device and inode, so a hard link or another spelling of the input
 * is recognised), and a new output is created exclusively: of two runs writing the same new
 * file, one wins and the other is refused.
 */
import * as fs from 'node:fs';
import * as path from 'node:path';
import { randomBytes } from 'node:crypto';
import { UsageError } from './io';

/** Why an output cannot be written, checked before any work is done. */
export function checkOutput(input: string, output: string, force: boolean): void {
  const outDir = path.dirname(path.resolve(output));
  let dirStat: fs.Stats;
  try {
    dirStat = fs.statSync(outDir);
  } catch {
    throw new UsageError(`the folder for the output does not exist: ${outDir}`);
  }
  if (!dirStat.isDirectory()) throw new UsageError(`the output's folder ${outDir} is not a folder`);
  let out: fs.Stats | undefined;
  try {
    out = fs.lstatSync(output);
  } catch {
    out = undefined;
  }
  if (out === undefined) return;
  if (out.isSymbolicLink()) {
    throw new UsageError(
      `${output} is a symbolic link: recalc never writes through a link (its target would be overwritten); ` +
        'remove the link or choose another name with -o',
    );
  }
  if (out.isDirectory()) throw new UsageError(`${output} is a folder: give a file name with -o`);
  const inp = fs.statSync(input);
  if (inp.dev === out.dev && inp.ino === out.ino) {
    throw new UsageError(
      `the output ${output} is the input itself (the same file, perhaps through a hard link): ` +
        'recalc never overwrites its input; choose another -o',
    );
  }
  if (!force) {
    throw new UsageError(
      `${output} already exists: add --force to replace it, or choose another name with -o`,
    );
  }
}

/** The temporary file name used while writing `output` (hidden, in the same folder). */
export function temporaryNameFor(output: string): string {
  const dir = path.dirname(path.resolve(output));
  return path.join(dir, `.${path.basename(output)}.${process.pid}.${randomBytes(4).toString('hex')}.tmp`);
}

/**
 * Writes `data` to `output` atomically. Without `force` the output must not exist (checked
 * again at the moment it is put in place, so two runs cannot both create it); with `force`
 * an existing regular file is replaced in one rename. A symbolic link at the output is
 * refused, even one made while this run worked.
 *
 * @throws UsageError where the output cannot be written; the temporary file is removed.
 */
export function writeFileAtomically(output: string, data: Uint8Array, force: boolean, input?: string): void {
  const tmp = temporaryNameFor(output);
  try {
    const fd = fs.openSync(tmp, 'wx', 0o666);
    try {
      let offset = 0;
      while (offset < data.length) offset += fs.writeSync(fd, data, offset, data.length - offset);
      fs.fsyncSync(fd);
    } finally {
      fs.closeSync(fd);
    }
    // The checks again, now: the output may have appeared or changed while this run worked.
    if (input !== undefined) checkOutput(input, output, force);
    if (force) {
      fs.renameSync(tmp, output);
    } else {
      try {
        fs.linkSync(tmp, output); // fails if the output exists: exclusive creation
      } catch (e) {
        if ((e as NodeJS.ErrnoException).code === 'EEXIST') {
          throw new UsageError(
            `${output} was created by someone else while this run worked: add --force to replace it, or choose another name with -o`,
          );
        }
        // A file system without hard links: copy exclusively instead.
        fs.copyFileSync(tmp, output, fs.constants.COPYFILE_EXCL);
      }
    }
  } catch (e) {
    if (e instanceof UsageError) throw e;
    throw new UsageError(`cannot write ${output} (${e instanceof Error ? e.message : String(e)})`);
  } finally {
    try {
      fs.unlinkSync(tmp);
    } catch {
      // Already renamed into place, or never created.
    }
  }
}
