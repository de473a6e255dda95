// The routing table as stored and shown: the march may take up to ROUTING_STEP_LIMIT steps per event, far more rows than
// a reader pages through or a stored result should carry. Keep evenly spaced rows, the first and last, and the rows of
// peak level and peak outflow, so that the table shows every figure the results quote.
import { ROUTING_TABLE_ROWS } from '@/lib/validation/input-limits';
import type { RoutingStep } from './routing-result';

export function routingTableRows(steps: readonly RoutingStep[], keepTimes: readonly number[], limit = ROUTING_TABLE_ROWS): RoutingStep[] {
  if (steps.length <= limit) return [...steps];
  const stride = Math.ceil((steps.length - 1) / (limit - 2 - keepTimes.length));
  return steps.filter((step, i) => i % stride === 0 || i === steps.length - 1 || keepTimes.includes(step.time));
}
