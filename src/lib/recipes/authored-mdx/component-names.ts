/** The calculator islands an authored body may place (server whitelist and client hydrator share it). */
export const ALLOWED_COMPONENT_NAMES = ['LoopResponse', 'FrequencyView', 'TuningComparison', 'BlockChain', 'PidConverter', 'Discretizer'] as const;

export type AllowedComponentName = (typeof ALLOWED_COMPONENT_NAMES)[number];
