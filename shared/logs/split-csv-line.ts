// Splits one CSV line into fields, honouring double quotes; quoted fields spanning lines are not supported.

export function splitCsvLine(line: string, delimiter: string): string[] {
  // Most logger rows have no quotes at all, and String#split is far faster than a scan.
  if (line.indexOf('"') === -1) return line.split(delimiter);
  const fields: string[] = [];
  let field = '';
  let quoted = false;
  for (let i = 0; i < line.length; i++) {
    const ch = line[i];
    if (quoted) {
      if (ch !== '"') field += ch;
      else if (line[i + 1] === '"') {
        field += '"';
        i++;
      } else quoted = false;
    } else if (ch === '"') quoted = true;
    else if (ch === delimiter) {
      fields.push(field);
      field = '';
    } else field += ch;
  }
  fields.push(field);
  return fields;
}
