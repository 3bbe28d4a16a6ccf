// What a file's first bytes say it is: text and its encoding, or the kind of file uploaded by mistake; and JPEG metadata size.
import { expect } from 'chai';
import { gzipSync } from 'node:zlib';
import { detectFileKind } from '../../../api/log-imports/file-kind.js';
import { jpegMetadataBytes } from '../../../api/photos/jpeg-metadata-bytes.js';

const text = 'Time,Temperature (°C)\n2026-03-01T08:00:00Z,4.0\n';

describe('detectFileKind', () => {
  it('reads UTF-8 (with or without a BOM), UTF-16 either way round (with or without a BOM) and Latin-1', () => {
    expect(detectFileKind(Buffer.from(text))).to.deep.equal({ text: true, encoding: 'utf8' });
    expect(detectFileKind(Buffer.from(`\ufeff${text}`))).to.deep.equal({ text: true, encoding: 'utf8' });
    const le = Buffer.from(text, 'utf16le');
    expect(detectFileKind(Buffer.concat([Buffer.from([0xff, 0xfe]), le]))).to.deep.equal({ text: true, encoding: 'utf16le' });
    expect(detectFileKind(le)).to.deep.equal({ text: true, encoding: 'utf16le' });
    const be = Buffer.from(le).swap16();
    expect(detectFileKind(Buffer.concat([Buffer.from([0xfe, 0xff]), be]))).to.deep.equal({ text: true, encoding: 'utf16be' });
    expect(detectFileKind(be)).to.deep.equal({ text: true, encoding: 'utf16be' });
    expect(detectFileKind(Buffer.from(text, 'latin1'))).to.deep.equal({ text: true, encoding: 'latin1' });
  });

  it('keeps UTF-8 with one damaged byte as UTF-8 (its degree signs still read)', () => {
    const damaged = Buffer.concat([Buffer.from(text), Buffer.from([0xe9]), Buffer.from(',note\n')]);
    expect(detectFileKind(damaged)).to.deep.equal({ text: true, encoding: 'utf8' });
  });

  it('keeps UTF-8 whose last character is cut off by the chunk (or a truncated file)', () => {
    const bytes = Buffer.from(`${text}5 °`);
    expect(detectFileKind(bytes.subarray(0, bytes.length - 1))).to.deep.equal({ text: true, encoding: 'utf8' });
  });

  it('names archives, documents and images, and calls noise binary', () => {
    const what = (bytes: Buffer) => {
      const kind = detectFileKind(bytes);
      return kind.text ? 'text' : kind.what;
    };
    expect(what(Buffer.from([0x50, 0x4b, 0x03, 0x04, 0x14, 0x00]))).to.match(/^a ZIP archive/);
    expect(what(gzipSync(Buffer.from(text)))).to.match(/^a gzip-compressed file/);
    expect(what(Buffer.from('%PDF-1.7\n'))).to.match(/^a PDF document/);
    expect(what(Buffer.from([0xd0, 0xcf, 0x11, 0xe0, 0xa1, 0xb1, 0x1a, 0xe1, 0, 0]))).to.match(/old Excel workbook/);
    expect(what(Buffer.from([0xff, 0xd8, 0xff, 0xe0]))).to.match(/JPEG image/);
    expect(what(Buffer.from(Array.from({ length: 512 }, (_, i) => (i * 37) % 256)))).to.match(/not a text file/);
  });

  it('does not call a text file with one stray NUL binary', () => {
    expect(detectFileKind(Buffer.from(`${text}2026-03-01T08:10:00Z,4\u00005\n`))).to.deep.equal({ text: true, encoding: 'utf8' });
  });
});

describe('jpegMetadataBytes', () => {
  it('adds up the APPn and comment segments before the scan, and is 0 for what is not a JPEG', () => {
    const segment = (marker: number, bytes: number) => Buffer.concat([Buffer.from([0xff, marker, (bytes + 2) >> 8, (bytes + 2) & 0xff]), Buffer.alloc(bytes)]);
    // Hand-computed: APP1 of 100 + 2 length bytes, APP2 of 50 + 2, a comment of 10 + 2; the quantisation table is not metadata.
    const jpeg = Buffer.concat([Buffer.from([0xff, 0xd8]), segment(0xe1, 100), segment(0xe2, 50), segment(0xfe, 10), segment(0xdb, 64), Buffer.from([0xff, 0xda, 0, 2])]);
    expect(jpegMetadataBytes(jpeg)).to.equal(102 + 52 + 12);
    expect(jpegMetadataBytes(Buffer.from('not a jpeg'))).to.equal(0);
  });
});
