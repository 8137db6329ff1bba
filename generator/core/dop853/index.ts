export { createDop853Workspace } from './workspace.ts';
export type { Dop853Workspace, Rhs, RhsFunction } from './workspace.ts';
export { autonomousRhs } from './autonomous-rhs.ts';
export { integrateDop853 } from './integrate.ts';
export type { Dop853Options, Dop853Result, Dop853Stats, StepObserver } from './integrate.ts';
export { evaluateDenseOutput } from './dense-output.ts';
export { IntegrationError } from './integration-error.ts';
