/** Cache keys for the signed-in person's data; everything account-related hangs under `all`. */
export const accountKeys = {
  all: ['account'] as const,
  me: () => [...accountKeys.all, 'me'] as const,
};
