// The Spanish twin checks, gathered for the content build, the stamp script and the tests.
export { twinProblems, compareBodies, compareMdx, compareYaml, compareNumbers, numbersOf } from "./twins";
export { twinPairs, type SpanishText, type TwinPair } from "./load-es";
