// The date and time shapes a logger file may use, as the patterns the sniffer recognises cells by.

const DATE = String.raw`(\d{1,4})([-/.])(\d{1,2})\2(\d{1,4})`;
const TIME = String.raw`(\d{1,2}):(\d{2})(?::(\d{2})(?:[.,](\d{1,9}))?)?`;
const MERIDIEM = String.raw`(?:\s*([ap])\.?\s?m\.?)?`;
const ZONE = String.raw`(z|(?:utc|gmt)?[+-]\d{1,2}(?::?\d{2})?|utc|gmt)`;

/** Groups: 1 2 3 4 date parts (2 = separator), 5 hour, 6 minute, 7 second, 8 fraction, 9 a/p, 10 offset. */
export const DATE_TIME_PATTERN = new RegExp(
  String.raw`^\s*${DATE}(?:\s*t\s*|\s+|,\s*)${TIME}${MERIDIEM}(?:\s*${ZONE})?\s*$`,
  'i',
);

export const DATE_PATTERN = new RegExp(String.raw`^\s*${DATE}\s*$`);

export const TIME_PATTERN = new RegExp(String.raw`^\s*${TIME}${MERIDIEM}\s*$`, 'i');

/** Whether a date-and-time text carries its own UTC offset. */
export const HAS_OFFSET_PATTERN = new RegExp(String.raw`${TIME}${MERIDIEM}\s*${ZONE}\s*$`, 'i');
