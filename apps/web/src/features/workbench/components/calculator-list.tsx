import { Card, Flex, Grid, Heading, Link, Text } from '@radix-ui/themes';
import { calculators } from '@skyledger/calc';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/config/paths';
import '../workbench.css';
import { PageHeader } from '@/components/ui/page-header';

/** Every calculator of the library, each opening its own form; a claim to save to goes along. */
export function CalculatorList({ claimId }: { claimId: string | null }) {
  return (
    <Flex direction="column" gap="5">
      <PageHeader
        title="Workbench"
        purpose="Back-of-envelope checks of the physics and statistics behind a claim, with published defaults. Each result is worked out as you type, step by step, with the limits of its model beside it; save one to a claim to cite it in a verdict."
      />
      <Grid asChild columns={{ initial: '1', sm: '2', lg: '3' }} gap="4">
        <ul className="sl-card-list sl-wb-cards">
          {calculators.map((calculator) => (
            <li key={calculator.id}>
              <Card size="2">
                <Flex direction="column" gap="2">
                  <Heading as="h2" size="4">
                    <Link asChild>
                      <RouterLink
                        to={paths.app.workbench.getHref(calculator.id, claimId ?? undefined)}
                      >
                        {calculator.title}
                      </RouterLink>
                    </Link>
                  </Heading>
                  <Text as="p" size="2">
                    {calculator.summary}
                  </Text>
                </Flex>
              </Card>
            </li>
          ))}
        </ul>
      </Grid>
    </Flex>
  );
}
