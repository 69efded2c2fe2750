/** Direction of heat flow through a building element, as ISO 6946 distinguishes it. */
export type HeatFlowDirection = 'upward' | 'horizontal' | 'downward';

export const HEAT_FLOW_DIRECTIONS: readonly HeatFlowDirection[] = ['upward', 'horizontal', 'downward'];
