/** Random: the seeded generator every module that needs randomness takes its numbers from. */
export { mulberry32 } from './mulberry32.ts';
