/** Query keys of the delivery log (e-mails sent to one client). */
export const weekMailKeys = {
  all: ['week-mail'] as const,
  deliveries: () => [...weekMailKeys.all, 'deliveries'] as const,
  delivery: (clientId: number) => [...weekMailKeys.deliveries(), clientId] as const,
};
