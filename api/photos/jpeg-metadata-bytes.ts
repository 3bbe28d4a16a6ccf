// Counts the bytes of a JPEG's application segments (EXIF, XMP, ICC, maker notes...) before its image data.

/**
 * Walks the markers from the start of the file to the start of the scan; 0 for anything that is not a JPEG.
 * A camera photo carries tens of kilobytes of such blocks, a few hundred with an embedded preview.
 */
export function jpegMetadataBytes(bytes: Uint8Array): number {
  if (bytes.length < 4 || bytes[0] !== 0xff || bytes[1] !== 0xd8) return 0;
  let total = 0;
  let at = 2;
  while (at + 4 <= bytes.length && bytes[at] === 0xff) {
    const marker = bytes[at + 1];
    if (marker === 0xda || marker === 0xd9) break; // start of scan, end of image
    const length = (bytes[at + 2] << 8) | bytes[at + 3];
    if (length < 2) break;
    if ((marker >= 0xe0 && marker <= 0xef) || marker === 0xfe) total += length; // APP0–APP15 and comments
    at += 2 + length;
  }
  return total;
}
