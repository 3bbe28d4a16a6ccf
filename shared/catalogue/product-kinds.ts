// The kinds and routes of administration a product's label names, with the words the screens show for them.
export const productKinds = ['live', 'inactivated'] as const;
export type ProductKind = (typeof productKinds)[number];

export const productKindLabels: Record<ProductKind, string> = { live: 'Live', inactivated: 'Inactivated' };

export const productRoutes = ['spray', 'drinking_water', 'injection', 'eye_drop', 'wing_web', 'in_ovo', 'other'] as const;
export type ProductRoute = (typeof productRoutes)[number];

export const productRouteLabels: Record<ProductRoute, string> = {
  spray: 'Spray',
  drinking_water: 'Drinking water',
  injection: 'Injection',
  eye_drop: 'Eye drop',
  wing_web: 'Wing web',
  in_ovo: 'In ovo',
  other: 'Other',
};
