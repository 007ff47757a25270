import { Card, Flex, Grid, Heading, Text } from '@radix-ui/themes';
import { roleLabels } from '@skyledger/contracts';
import { DocumentTitle } from '@/components/ui/document-title';
import { roleDuties } from '@/config/role-duties';
import { useCurrentUser } from '@/features/auth/current-user';

const claimLife = [
  'A claim comes in from a speech, a post or a press release, and is filed as it was said.',
  'The desk traces where it first appeared, gathers sources and grades them.',
  'A science editor runs the physics and statistics, then drafts a verdict and an explainer.',
  'Someone who did not draft it signs it off, and only then is it published for readers.',
  'Published explainers stay corrected: every change is dated and on the record.',
];

export function Component() {
  const user = useCurrentUser();
  const duties = roleDuties[user.role];
  const firstName = user.displayName.split(' ')[0] ?? user.displayName;

  return (
    <Flex direction="column" gap="6">
      <DocumentTitle title="Desk" />
      <Flex direction="column" gap="2">
        <Heading as="h1" size={{ initial: '7', sm: '8' }}>
          Welcome to the desk, {firstName}
        </Heading>
        <Text as="p" size="4" className="sl-prose">
          Your role is {roleLabels[user.role].toLowerCase()}: {duties.youDo}.
        </Text>
      </Flex>
      <Grid columns={{ initial: '1', md: '2' }} gap="5">
        <Card size="3">
          <Flex direction="column" gap="3">
            <Heading as="h2" size="4">
              What you may do here
            </Heading>
            <ul className="sl-list">
              {duties.mayDo.map((duty) => (
                <li key={duty}>
                  <Text>{duty}</Text>
                </li>
              ))}
            </ul>
          </Flex>
        </Card>
        <Card size="3">
          <Flex direction="column" gap="3">
            <Heading as="h2" size="4">
              How a claim moves through the desk
            </Heading>
            <ol className="sl-list">
              {claimLife.map((step) => (
                <li key={step}>
                  <Text>{step}</Text>
                </li>
              ))}
            </ol>
          </Flex>
        </Card>
      </Grid>
    </Flex>
  );
}
