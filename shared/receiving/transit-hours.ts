// Hours a shipment spent between shipping and arrival; guidance wants under 48 (PHAC 2007 §9.2).
export const TRANSIT_LIMIT_HOURS = 48;

export function transitHours(shippedAt: string | null, arrivedAt: string): number | null {
  if (!shippedAt) return null;
  return (Date.parse(arrivedAt) - Date.parse(shippedAt)) / 3_600_000;
}
