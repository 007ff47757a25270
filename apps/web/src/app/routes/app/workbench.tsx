import { calculators } from '@skyledger/calc';
import { uuidSchema } from '@skyledger/contracts';
import type { QueryClient } from '@tanstack/react-query';
import { data, useParams, useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { DocumentTitle } from '@/components/ui/document-title';
import { sessionQueryOptions } from '@/features/auth/api/get-session';
import { useCurrentUser } from '@/features/auth/current-user';
import { claimQueryOptions } from '@/features/claims/api/get-claim';
import { hasClaimRole } from '@/features/claims/claim-permissions';
import { datasetsQueryOptions } from '@/features/datasets/api/get-datasets';
import { CalculatorList } from '@/features/workbench/components/calculator-list';
import { WorkbenchCalculator } from '@/features/workbench/components/workbench-calculator';
import { mayOpen, navItem } from '../../nav-items';
import { NoAccess } from './no-access';

const calculatorOf = (id: string | undefined) =>
  id === undefined ? undefined : calculators.find((calculator) => calculator.id === id);

/** The claim to save to, from `?claim=`; anything but a claim id is ignored. */
function claimOf(searchParams: URLSearchParams): string | null {
  const claim = searchParams.get('claim');
  return claim !== null && uuidSchema.safeParse(claim).success ? claim : null;
}

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    // An address that names no calculator is a page that does not exist.
    if (params.calculatorId !== undefined && !calculatorOf(params.calculatorId)) {
      throw data(null, { status: 404 });
    }
    const user = await queryClient.ensureQueryData(sessionQueryOptions());
    if (!user || !mayOpen(user.role, 'workbench')) return null;
    const calculator = calculatorOf(params.calculatorId);
    // Started, not awaited: the form works without them and shows their loading itself.
    if (calculator?.inputs.some((spec) => spec.kind === 'series' || spec.kind === 'seriesList')) {
      void queryClient.prefetchQuery(datasetsQueryOptions());
    }
    const claimId = claimOf(new URL(request.url).searchParams);
    if (calculator && claimId && hasClaimRole(user.role, 'research')) {
      void queryClient.prefetchQuery(claimQueryOptions(claimId));
    }
    return null;
  };

export function Component() {
  const user = useCurrentUser();
  const { calculatorId } = useParams();
  const [searchParams, setSearchParams] = useSearchParams();
  if (!mayOpen(user.role, 'workbench')) return <NoAccess item={navItem('workbench')} />;
  const claimId = claimOf(searchParams);
  const calculator = calculatorOf(calculatorId);
  if (!calculator) {
    return (
      <>
        <DocumentTitle title="Workbench" />
        <CalculatorList claimId={claimId} />
      </>
    );
  }
  return (
    <>
      <DocumentTitle title={`${calculator.title} · Workbench`} />
      {/* A fresh form per calculator, so nothing typed into one is read as another's input. */}
      <WorkbenchCalculator
        key={calculator.id}
        calculator={calculator}
        role={user.role}
        claimId={claimId}
        onClaimChange={(next) =>
          setSearchParams(next ? { claim: next } : {}, { replace: true, preventScrollReset: true })
        }
      />
    </>
  );
}
