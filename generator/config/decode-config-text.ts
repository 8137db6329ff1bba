// A config file's bytes as text: UTF-8 only (a UTF-8 byte-order mark is dropped). A UTF-16 or binary
// file is refused in one line that says what was found, instead of being parsed as garbage and quoted
// back byte for byte.
import { ConfigError } from './validate-config.ts';

const utf8 = new TextDecoder('utf-8', { fatal: true });

export function decodeConfigText(bytes: Uint8Array, label: string): string {
  const refuse = (what: string) => new ConfigError(`config ${label}: ${what} (a catalog config is YAML text in UTF-8)`);
  if ((bytes[0] === 0xff && bytes[1] === 0xfe) || (bytes[0] === 0xfe && bytes[1] === 0xff)) {
    throw refuse('is UTF-16 text (save it as UTF-8)');
  }
  const nul = bytes.indexOf(0);
  if (nul >= 0) throw refuse(`holds a NUL byte at offset ${nul}, so it is not text (UTF-16 or a binary file?)`);
  try {
    return utf8.decode(bytes).replace(/^\uFEFF/, '');
  } catch {
    throw refuse('is not valid UTF-8 (a binary file, or text in another encoding?)');
  }
}
