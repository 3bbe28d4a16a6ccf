// Only a spray vaccination uses a sprayer: its trial and its cleaning checklist belong to no other route (the flock record agrees).
export function usesSprayer(route: string): boolean {
  return route === 'spray';
}

/** What the run says where the sprayer's steps would be, for any other route. */
export function noSprayerText(route: string): string {
  return `No sprayer for a ${route.replace('_', ' ')} vaccination.`;
}
