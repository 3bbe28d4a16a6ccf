// The roles a user may hold; a user may hold several.
export const roles = ['admin', 'receiving', 'storage', 'purchasing', 'veterinarian', 'crew'] as const;

export type Role = (typeof roles)[number];

export const roleLabels: Record<Role, string> = {
  admin: 'Administrator',
  receiving: 'Receiving clerk',
  storage: 'Storage staff',
  purchasing: 'Purchasing',
  veterinarian: 'Veterinarian',
  crew: 'Vaccination crew',
};

export function isRole(value: unknown): value is Role {
  return typeof value === 'string' && (roles as readonly string[]).includes(value);
}
