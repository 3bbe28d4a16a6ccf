// Who works with flocks, houses, programmes and vaccinations: admins, purchasing and veterinarians keep them; crews read them.
export const flockKeepers = ['admin', 'purchasing', 'veterinarian'] as const;
export const flockReaders = ['admin', 'purchasing', 'veterinarian', 'crew'] as const;
