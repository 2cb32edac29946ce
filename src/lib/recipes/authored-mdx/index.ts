/** Safe authored MDX: parse, never evaluate; validate; render sanitized HTML with island placeholders. */
export { compileBody, type CompileResult } from './compile';
export { compileBodyIsolated, stopCompileWorker } from './compile-isolated';
export { describeProblem, type BodyProblem } from './problem';
export { BODY_LIMITS } from './limits';
export { ALLOWED_COMPONENTS, ALLOWED_COMPONENT_NAMES, type AllowedComponentName } from './allowed-components';
export type { PlacedIsland } from './validate';
