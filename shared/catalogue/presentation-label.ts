// How a presentation is named on screens, reports and mail: product, doses per vial, vials per pack.
export function presentationLabel(productName: string, presentation: { dosesPerVial: number; vialsPerPack: number }): string {
  const doses = presentation.dosesPerVial.toLocaleString('en-US');
  return `${productName}, ${doses} doses × ${presentation.vialsPerPack} vials`;
}
