import { Button, Code, Flex, Heading, Text } from '@radix-ui/themes';
import { isRouteErrorResponse, Link as RouterLink, useRouteError } from 'react-router-dom';
import { PlainCard } from '@/components/layouts/plain-card';
import { PlainLayout } from '@/components/layouts/plain-layout';
import { DocumentTitle } from '@/components/ui/document-title';
import { paths } from '@/config/paths';
import { isApiError } from '@/lib/api-client';
import { errorMessage } from '@/lib/api-error-messages';

interface ErrorCopy {
  title: string;
  message: string;
}

function describeRouteError(error: unknown): ErrorCopy {
  if (isRouteErrorResponse(error) && error.status === 404) {
    return { title: 'Page not found', message: 'There is no page at this address.' };
  }
  if (isApiError(error) && error.status === 403) {
    return {
      title: "You don't have access",
      message: 'Your role on the desk does not include this page. A desk chief can change roles.',
    };
  }
  if (isApiError(error)) return { title: 'This page could not load', message: errorMessage(error) };
  return {
    title: 'Something went wrong',
    message:
      'This page ran into a problem it could not get past. Try again, or go back to the desk.',
  };
}

function ErrorDetails({ error }: { error: unknown }) {
  if (!import.meta.env.DEV || !(error instanceof Error)) return null;
  return (
    <Code variant="ghost" size="1" color="gray">
      {error.message}
    </Code>
  );
}

function ErrorActions() {
  return (
    <Flex gap="3" wrap="wrap">
      <Button asChild highContrast>
        <RouterLink to={paths.app.desk.getHref()}>Back to the desk</RouterLink>
      </Button>
      <Button variant="soft" color="gray" highContrast onClick={() => window.location.reload()}>
        Try again
      </Button>
    </Flex>
  );
}

/** Errors inside the signed-in frame: the header and navigation stay. */
export function PageErrorBoundary() {
  const error = useRouteError();
  const copy = describeRouteError(error);
  return (
    <Flex direction="column" gap="4">
      <DocumentTitle title={copy.title} />
      <Heading as="h1" size="7">
        {copy.title}
      </Heading>
      <Text as="p" className="sl-prose">
        {copy.message}
      </Text>
      <ErrorDetails error={error} />
      <ErrorActions />
    </Flex>
  );
}

/** Errors anywhere else, or in the frame itself: a page of its own. */
export function RootErrorBoundary() {
  const error = useRouteError();
  const copy = describeRouteError(error);
  return (
    <PlainLayout>
      <DocumentTitle title={copy.title} />
      <PlainCard title={copy.title} intro={copy.message}>
        <ErrorDetails error={error} />
        <ErrorActions />
      </PlainCard>
    </PlainLayout>
  );
}
