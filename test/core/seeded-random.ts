// The tests draw their "random" states from the generator's seeded PRNG, so they are the same every run.
export { seededRandom } from '../../generator/core/random/seeded-random.ts';
