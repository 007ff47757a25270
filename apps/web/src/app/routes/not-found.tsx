import { Button } from '@radix-ui/themes';
import { Link as RouterLink } from 'react-router-dom';
import { PlainCard } from '@/components/layouts/plain-card';
import { PlainLayout } from '@/components/layouts/plain-layout';
import { DocumentTitle } from '@/components/ui/document-title';
import { paths } from '@/config/paths';

export function Component() {
  return (
    <PlainLayout>
      <DocumentTitle title="Page not found" />
      <PlainCard
        title="Page not found"
        intro="There is no page at this address. It may have moved, or the link was cut short."
      >
        <Button asChild size="3" highContrast>
          <RouterLink to={paths.app.desk.getHref()}>Back to the desk</RouterLink>
        </Button>
      </PlainCard>
    </PlainLayout>
  );
}
