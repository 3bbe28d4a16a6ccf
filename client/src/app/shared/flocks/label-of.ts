// Looks a row's value up in a label or colour map from a table template, where Material's row context is untyped.
export function labelOf<K extends string, V>(map: Record<K, V>, key: K): V {
  return map[key];
}
