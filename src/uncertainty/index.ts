/** The uncertainty layer: distributions, sampling, Monte Carlo, FORM, variables by field path. */
export { erfc } from './erfc';
export { normalCdf, normalDensity, normalQuantile } from './standard-normal';
export { seededUniform, randomIndex } from './random';
export { makeDistribution, distribution, DISTRIBUTION_NAMES } from './distributions';
export type { Distribution, DistributionName, DistributionParams, DistributionResult } from './distributions';
export { createSampler, SAMPLING_METHODS } from './sampler';
export type { Sampler, SamplerOptions, SamplingMethod } from './sampler';
export { rankCorrelation, rankSetCorrelation, averageRanks } from './rank-correlation';
export { failureProbability, Z_95 } from './failure-probability';
export type { FailureProbability } from './failure-probability';
export { fsHistogram } from './histogram';
export type { FsHistogram, HistogramBin } from './histogram';
export { createMonteCarloRun, runMonteCarlo, runMonteCarloAsync, pfVersusSpan } from './monte-carlo';
export type { Evaluate, SampleOutcome, MonteCarloOptions, MonteCarloResult, MonteCarloRun, ModeProbability, SpanProbability } from './monte-carlo';
export { form } from './form';
export type { FormOptions, FormResult } from './form';
export { ELIGIBLE_FIELDS, eligibleField, resolveVariables, projectValueAt, applySample, brazilianVariable, MIN_SPECIMENS_FOR_VARIABLE } from './variables';
export type { VariableSpec, Variable, VariablesResult, EligibleField } from './variables';
