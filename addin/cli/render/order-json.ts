/**
 * The JSON fields of an order-of-integration result: order (0, 1, 2 or "above 2"), agree,
 * verdict, warnings, and steps with each ADF and KPSS result in the shape of testResultJson.
 */
import type { IntegrationOrderResult } from '../../unitroot/integration-order';
import { testResultJson } from './test-json';

/** The JSON fields of one order-of-integration result. */
export function orderResultJson(result: IntegrationOrderResult): Record<string, unknown> {
  return {
    name: result.name,
    order: result.order,
    agree: result.agree,
    deterministic: result.deterministic,
    verdict: result.verdict,
    warnings: result.warnings.slice(),
    steps: result.steps.map((s) => ({
      differences: s.differences,
      adfRejects: s.adfRejects,
      kpssRejects: s.kpssRejects,
      adf: testResultJson(s.adf),
      kpss: testResultJson(s.kpss),
    })),
  };
}
