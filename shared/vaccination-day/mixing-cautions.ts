// The usual cautions printed on the mixing sheet and shown beside it (common practice); the label and the veterinarian come first.
export const mixingCautions: readonly string[] = [
  'Wear protective equipment while mixing, spraying and cleaning: hairnet, mask, eye protection, gloves, long sleeves, boots.',
  'Mix with distilled, non-chlorinated water only; no sanitizer or medication in the water or the sprayer.',
  'Mix out of direct sun; keep the vials cool until they are opened.',
  'Take only the vials needed; put unopened vials straight back in the fridge.',
  'Use the mix within the time the label gives, counted from mixing.',
];

export const followLabel = 'Follow the label and the veterinarian.';
