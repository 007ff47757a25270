import { Badge, TabNav } from '@radix-ui/themes';
import { Link as RouterLink } from 'react-router-dom';

export interface CountTab {
  label: string;
  count: number;
  /** The address of the view, its other filters kept. */
  to: string;
  active: boolean;
}

/** Views of one list as links, each with how many rows it holds, e.g. mails by state. */
export function CountTabNav({ label, tabs }: { label: string; tabs: readonly CountTab[] }) {
  return (
    <TabNav.Root aria-label={label} className="sl-scroll-x">
      {tabs.map((tab) => (
        <TabNav.Link key={tab.label} asChild active={tab.active}>
          <RouterLink to={tab.to}>
            {tab.label}
            <Badge color="gray" variant="soft" highContrast radius="full" ml="1">
              {tab.count}
            </Badge>
          </RouterLink>
        </TabNav.Link>
      ))}
    </TabNav.Root>
  );
}
