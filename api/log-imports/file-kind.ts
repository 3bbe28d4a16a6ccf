// Tells from a file's first bytes how its text is encoded, or that it is no text at all (an archive, a PDF, noise).

export type TextEncoding = 'utf8' | 'utf16le' | 'utf16be' | 'latin1';

export type FileKind = { text: true; encoding: TextEncoding } | { text: false; what: string };

/** Signatures of files people upload by mistake, and what to tell them. */
const SIGNATURES: { bytes: number[]; what: string }[] = [
  { bytes: [0x50, 0x4b, 0x03, 0x04], what: 'a ZIP archive (a spreadsheet workbook or a compressed folder); export the readings as CSV or text' },
  { bytes: [0x50, 0x4b, 0x05, 0x06], what: 'an empty ZIP archive; export the readings as CSV or text' },
  { bytes: [0x1f, 0x8b], what: 'a gzip-compressed file; uncompress it and upload the CSV inside' },
  { bytes: [0x25, 0x50, 0x44, 0x46], what: 'a PDF document; upload the logger\'s CSV or text export, not a report' },
  { bytes: [0xd0, 0xcf, 0x11, 0xe0, 0xa1, 0xb1, 0x1a, 0xe1], what: 'an old Excel workbook (.xls); save it as CSV' },
  { bytes: [0x37, 0x7a, 0xbc, 0xaf, 0x27, 0x1c], what: 'a 7-Zip archive; unpack it and upload the CSV inside' },
  { bytes: [0x89, 0x50, 0x4e, 0x47], what: 'a PNG image, not a logger file' },
  { bytes: [0xff, 0xd8, 0xff], what: 'a JPEG image, not a logger file' },
];

const startsWith = (head: Uint8Array, bytes: number[]) => head.length >= bytes.length && bytes.every((b, i) => head[i] === b);

/** Bytes that never appear in a text file (tab, line ends, form feed and escape do). */
const isControl = (b: number) => b < 9 || b === 11 || (b > 13 && b < 32 && b !== 27) || b === 127;

/** UTF-16 without a byte-order mark shows as a zero in every other byte of Latin text. */
function utf16WithoutBom(sample: Uint8Array): TextEncoding | undefined {
  const pairs = Math.floor(sample.length / 2);
  if (pairs < 2) return undefined;
  let evenZeros = 0;
  let oddZeros = 0;
  for (let i = 0; i + 1 < sample.length; i += 2) {
    if (sample[i] === 0) evenZeros++;
    if (sample[i + 1] === 0) oddZeros++;
  }
  if (oddZeros > pairs * 0.4 && evenZeros < pairs * 0.05) return 'utf16le';
  if (evenZeros > pairs * 0.4 && oddZeros < pairs * 0.05) return 'utf16be';
  return undefined;
}

/** The head without a multi-byte sequence cut off at its end (the rest of it is in the next chunk, or the file was cut). */
function withoutCutSequence(head: Uint8Array): Uint8Array {
  for (let back = 1; back <= Math.min(4, head.length); back++) {
    const b = head[head.length - back];
    if ((b & 0xc0) === 0x80) continue; // a continuation byte: look further back for the lead
    if (b < 0x80) return head;
    const needed = b >= 0xf0 ? 4 : b >= 0xe0 ? 3 : 2;
    return needed > back ? head.subarray(0, head.length - back) : head;
  }
  return head;
}

/** A well-formed two- to four-byte UTF-8 sequence somewhere in the sample (Latin-1 text almost never makes one). */
function hasUtf8Sequence(sample: Uint8Array): boolean {
  for (let i = 0; i < sample.length; i++) {
    const b = sample[i];
    if (b < 0xc2 || b > 0xf4) continue;
    const length = b >= 0xf0 ? 4 : b >= 0xe0 ? 3 : 2;
    let k = 1;
    while (k < length && i + k < sample.length && (sample[i + k] & 0xc0) === 0x80) k++;
    if (k === length) return true;
  }
  return false;
}

function isUtf8(head: Uint8Array): boolean {
  try {
    new TextDecoder('utf-8', { fatal: true }).decode(withoutCutSequence(head));
    return true;
  } catch {
    return false;
  }
}

/** `head` is the file's first chunk (any length; 4 kB or more decides well). */
export function detectFileKind(head: Uint8Array): FileKind {
  if (startsWith(head, [0xef, 0xbb, 0xbf])) return { text: true, encoding: 'utf8' };
  if (startsWith(head, [0xff, 0xfe])) return { text: true, encoding: 'utf16le' };
  if (startsWith(head, [0xfe, 0xff])) return { text: true, encoding: 'utf16be' };
  const signature = SIGNATURES.find((s) => startsWith(head, s.bytes));
  if (signature) return { text: false, what: signature.what };
  const sample = head.subarray(0, 4096);
  const utf16 = utf16WithoutBom(sample);
  if (utf16) return { text: true, encoding: utf16 };
  let controls = 0;
  for (const b of sample) if (isControl(b)) controls++;
  // One stray NUL is a damaged row (a warning on its line); this many is not text.
  if (controls >= 8 && controls > sample.length * 0.02) return { text: false, what: 'not a text file (it holds binary data); upload the logger\'s CSV or text export' };
  // Old Windows exports write ° and accented letters in Latin-1, which is not valid UTF-8; a UTF-8 file with one
  // damaged byte still has its other multi-byte characters (the ° of its header), and stays UTF-8.
  return { text: true, encoding: isUtf8(head) || hasUtf8Sequence(sample) ? 'utf8' : 'latin1' };
}
