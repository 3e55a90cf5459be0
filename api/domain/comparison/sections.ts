import type { ComparisonQuery, PagedComparison } from "../../../core/contract/comparison";
import type { ComparisonInput } from "./build";
import { comparisonLinearizations, type StoredLineForComparison } from "./linearizations";
import { comparisonPage } from "./paging";

/**
 * One page of the comparison's rows with the sections that stand beside them (saved stress
 * classification lines): what the comparison route answers and what a frozen record keeps, so
 * the two never differ in what they include.
 */
export async function comparisonPageWithSections(
  input: ComparisonInput & { linearizations: readonly StoredLineForComparison[] },
  query: ComparisonQuery,
): Promise<PagedComparison> {
  const page = await comparisonPage(input, query);
  const linearizations = comparisonLinearizations(input.linearizations, input.cases, input.locations);
  return { ...page, linearizations };
}
