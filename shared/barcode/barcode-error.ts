// The one error type the barcode parser throws, so callers can tell bad scans from programming faults.
export class BarcodeError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'BarcodeError';
  }
}
