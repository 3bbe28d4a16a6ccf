// Who works the vaccination day: crews run it, admins and veterinarians plan and oversee it; only a veterinarian overrides a check.
export const dayWorkers = ['admin', 'veterinarian', 'crew'] as const;
/** Plan and oversee any crew's day. */
export const dayPlanners = ['admin', 'veterinarian'] as const;
export const crewAssigners = ['admin', 'veterinarian', 'crew'] as const;
export const waterVolumeKeepers = ['admin', 'veterinarian'] as const;
export const historyReaders = ['admin', 'purchasing', 'veterinarian', 'crew'] as const;
