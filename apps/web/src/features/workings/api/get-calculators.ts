import type { CalculatorInfo } from '@skyledger/calc';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { workingKeys } from './working-keys';

/** What `GET /api/calculators` answers: the library's descriptions, without its code. */
export interface CalculatorCatalogue {
  libraryVersion: string;
  calculators: readonly CalculatorInfo[];
}

/**
 * The calculators' titles, input and output labels, read from the API rather than from
 * @skyledger/calc itself, which would bring its unit engine into every page that shows one.
 */
export function getCalculators(): Promise<CalculatorCatalogue> {
  return api.get<CalculatorCatalogue>('/calculators');
}

export const calculatorsQueryOptions = () =>
  queryOptions({
    queryKey: workingKeys.calculators(),
    queryFn: getCalculators,
    // The library changes only with a new release of the desk.
    staleTime: Infinity,
  });

export function useCalculators() {
  return useQuery(calculatorsQueryOptions());
}
