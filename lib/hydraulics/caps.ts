/** caps on what one calculation may hold (schemas.ts enforces them; forms read them without zod) */
export const INPUT_CAPS = {
  labelChars: 80,
  numberTextChars: 32,
  designSprinklers: 2,
  pipeRuns: 50,
  devices: 10,
} as const;
