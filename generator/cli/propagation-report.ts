// What `cycler-atlas propagate` prints: one JSON object, or the samples as CSV.
import type { PropagationResult } from '../core/propagation/propagate.ts';
import type { TrajectorySamples } from '../core/propagation/sample-trajectory.ts';

export interface PropagationReportInput {
  mu: number;
  systemId: string | null;
  state0: readonly number[];
  timeNd: number;
  result: PropagationResult;
  withStm: boolean;
  withEvents: boolean;
  seconds: number;
  samples: TrajectorySamples | null;
}

/** The JSON contract: state (as many numbers as given), stm (row-major, with --stm), counters, seconds, events. */
export function propagationReport(input: PropagationReportInput): Record<string, unknown> {
  const { result } = input;
  const dim = input.state0.length;
  const report: Record<string, unknown> = {
    mu: input.mu,
    system: input.systemId,
    timeNd: input.timeNd,
    tFinalNd: result.tFinalNd,
    stoppedByEvent: result.terminated,
    state: Array.from(result.state),
  };
  if (input.withStm && result.stm) report.stm = Array.from(result.stm);
  report.rhsEvaluations = result.rhsEvaluations;
  report.steps = result.steps;
  report.rejectedSteps = result.rejectedSteps;
  report.seconds = input.seconds;
  if (input.withEvents) {
    report.events = result.events.map((hit) => {
      const event: Record<string, unknown> = {
        label: hit.label, count: hit.count, t: hit.tNd, state: Array.from(hit.vector.subarray(0, dim)),
      };
      if (input.withStm) event.stm = Array.from(hit.vector.subarray(dim, dim + dim * dim));
      return event;
    });
  }
  if (input.samples) {
    const { timesNd, states } = input.samples;
    report.samples = Array.from(timesNd, (t, i) => ({ t, state: Array.from(states.subarray(6 * i, 6 * i + 6)) }));
  }
  return report;
}

export const SAMPLE_CSV_HEADER = 't,x,y,z,vx,vy,vz';

/** One line per sample, full precision (shortest text that reads back to the same double). */
export function samplesCsv(samples: TrajectorySamples): string {
  const lines = [SAMPLE_CSV_HEADER];
  for (let i = 0; i < samples.timesNd.length; i++) {
    lines.push([samples.timesNd[i], ...samples.states.subarray(6 * i, 6 * i + 6)].join(','));
  }
  return `${lines.join('\n')}\n`;
}
