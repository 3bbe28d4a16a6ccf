// Limits on photos taken at receiving: bytes and count per upload, decoded pixels, and the sizes kept.
export const photoLimits = {
  /** A phone camera's JPEG is 2–8 MB; more is not a photo of a box. */
  maxBytes: 15 * 1024 * 1024,
  maxFilesPerRequest: 8,
  maxPerShipment: 24,
  /** Decoded pixels: refuses decompression bombs; phone cameras save 12–50 megapixels. */
  maxInputPixels: 100_000_000,
  /** EXIF, XMP, ICC and other blocks of a JPEG: tens of kB from a camera, a few hundred with previews (common practice). */
  maxMetadataBytes: 4 * 1024 * 1024,
  displaySize: 1600,
  thumbSize: 320,
} as const;
