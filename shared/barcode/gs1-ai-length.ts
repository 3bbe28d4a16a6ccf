// How many digits an AI has, from its first two digits: raw scanner data has no brackets to tell us.
const LENGTH_BY_PREFIX: Readonly<Record<string, number>> = (() => {
  const table: Record<string, number> = {};
  const assign = (length: number, prefixes: string[]) => prefixes.forEach((prefix) => (table[prefix] = length));
  assign(2, ['00', '01', '02', '10', '11', '12', '13', '15', '16', '17', '20', '21', '22', '30', '37']);
  assign(3, ['23', '24', '25', '40', '41', '42', '71']);
  assign(4, ['31', '32', '33', '34', '35', '36', '39', '43', '70', '72', '80', '81', '82']);
  for (let prefix = 90; prefix <= 99; prefix++) table[String(prefix)] = 2;
  return table;
})();

/** Length of the AI that `data` starts with, or undefined when no GS1 AI starts with those two digits. */
export function gs1AiLength(data: string): number | undefined {
  return /^\d\d/.test(data) ? LENGTH_BY_PREFIX[data.slice(0, 2)] : undefined;
}
