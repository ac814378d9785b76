/** Exact time conversions used inside the sun module (not re-exported: the units module owns the public ones). */
export const msPerMinute = 60_000;
export const msPerHour = 3_600_000;
export const msPerDay = 86_400_000;
