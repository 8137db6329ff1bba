// Checks of the file paths given on the command line, before any file is opened: each failure is one
// line naming the option, the path and what it must be (exit 2), instead of the driver's "disk I/O
// error" or "unable to open database file", and no output may land on an input.
import { accessSync, closeSync, constants, existsSync, openSync, readSync, statSync } from 'node:fs';
import { basename, dirname, resolve } from 'node:path';
import { isCatalogOrSideFile } from '../../catalog-db/same-file.ts';
import { UsageError } from '../errors/usage-error.ts';

const CATALOG_FILE = 'a catalog file written by generate';
/** Longest file name most file systems allow (bytes of one path component). */
const MAX_NAME_BYTES = 255;

/** A catalog to read: an existing file (not a directory). */
export function assertReadableCatalogPath(option: string, path: string): void {
  assertPlausiblePath(option, path, CATALOG_FILE);
  if (!existsSync(path)) throw new UsageError(`${option}: "${path}" does not exist (${CATALOG_FILE})`);
  if (statSync(path).isDirectory()) throw new UsageError(`${option}: "${path}" is a directory (${CATALOG_FILE})`);
  assertSqliteFile(option, path, CATALOG_FILE);
}

/** A catalog to write (created if missing): a writable file in an existing, writable directory. */
export function assertWritableCatalogPath(option: string, path: string): void {
  const what = 'a catalog file to write, created if missing';
  assertWritableFilePath(option, path, what);
  if (existsSync(path)) assertSqliteFile(option, path, what);
}

/** A file to write that must not be any of the inputs (or their SQLite side files). */
export function assertOutputIsNotInput(option: string, path: string, inputs: ReadonlyArray<readonly [option: string, path: string]>): void {
  assertWritableFilePath(option, path, 'a file to write');
  for (const [inputOption, inputPath] of inputs) {
    if (isCatalogOrSideFile(path, inputPath)) {
      throw new UsageError(`${option}: "${path}" is the file given as ${inputOption} ("${inputPath}"); writing it would destroy it (give another file)`);
    }
  }
}

function assertWritableFilePath(option: string, path: string, what: string): void {
  assertPlausiblePath(option, path, what);
  if (existsSync(path)) {
    if (statSync(path).isDirectory()) throw new UsageError(`${option}: "${path}" is a directory (${what})`);
    if (!canAccess(path, constants.W_OK)) throw new UsageError(`${option}: "${path}" is read-only (${what})`);
    return;
  }
  const directory = dirname(resolve(path));
  if (!existsSync(directory) || !statSync(directory).isDirectory()) {
    throw new UsageError(`${option}: "${path}" cannot be created: directory ${directory} does not exist (${what})`);
  }
  if (!canAccess(directory, constants.W_OK)) {
    throw new UsageError(`${option}: "${path}" cannot be created: directory ${directory} is read-only (${what})`);
  }
}

function assertPlausiblePath(option: string, path: string, what: string): void {
  if (path.trim() === '') throw new UsageError(`${option}: "${path}" is not allowed (${what}; an empty path names no file)`);
  const tooLong = resolve(path).split(/[\\/]/).find((part) => Buffer.byteLength(part) > MAX_NAME_BYTES);
  if (tooLong !== undefined) {
    throw new UsageError(`${option}: "${shorten(path)}" is not allowed (${what}; a file or directory name of at most ${MAX_NAME_BYTES} bytes, "${shorten(basename(tooLong))}" has ${Buffer.byteLength(tooLong)})`);
  }
}

/** Every SQLite file starts with these 16 bytes (sqlite.org/fileformat.html); an empty file is a new one. */
const SQLITE_MAGIC = Buffer.from('SQLite format 3\0', 'latin1');

function assertSqliteFile(option: string, path: string, what: string): void {
  const head = Buffer.alloc(SQLITE_MAGIC.length);
  let read = 0;
  try {
    const fd = openSync(path, 'r');
    try {
      read = readSync(fd, head, 0, head.length, 0);
    } finally {
      closeSync(fd);
    }
  } catch (error) {
    throw new UsageError(`${option}: "${path}" cannot be read (${(error as NodeJS.ErrnoException).code ?? String(error)}; ${what})`);
  }
  if (read > 0 && !head.subarray(0, read).equals(SQLITE_MAGIC.subarray(0, read))) {
    throw new UsageError(`${option}: "${path}" is not a catalog: not an SQLite file (${what})`);
  }
}

function canAccess(path: string, mode: number): boolean {
  try {
    accessSync(path, mode);
    return true;
  } catch {
    return false;
  }
}

function shorten(text: string): string {
  return text.length > 40 ? `${text.slice(0, 20)}…${text.slice(-12)}` : text;
}
