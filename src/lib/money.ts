/** A price in cents as the app shows it: 399 → "$3.99" (the workspace's prices are dollars and cents). */
export const money = (cents: number) => `$${(cents / 100).toFixed(2)}`;
