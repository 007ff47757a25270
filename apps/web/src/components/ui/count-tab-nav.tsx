import { Badge, TabNav } from '@radix-ui/themes';
import { Link as RouterLink } from 'react-router-dom';

interface CountTabNavProps<Key extends string> {
  label: string;
  /** The views besides "All", in order, with their names and how many rows each holds. */
  keys: readonly Key[];
  names: Record<Key, string>;
  counts: Record<Key, number>;
  /** The view shown; undefined for "All". */
  current: Key | undefined;
  /** The address of a view, the list's other filters kept. */
  hrefOf: (key: Key | undefined) => string;
}

/** Views of one list as links, "All" first, each with how many rows it holds. */
export function CountTabNav<Key extends string>({
  label,
  keys,
  names,
  counts,
  current,
  hrefOf,
}: CountTabNavProps<Key>) {
  const all = keys.reduce((sum, key) => sum + counts[key], 0);
  const tabs = [
    { key: undefined, name: 'All', count: all },
    ...keys.map((key) => ({ key, name: names[key], count: counts[key] })),
  ];
  return (
    <TabNav.Root aria-label={label} className="sl-scroll-x">
      {tabs.map(({ key, name, count }) => (
        <TabNav.Link key={name} asChild active={current === key}>
          <RouterLink to={hrefOf(key)}>
            {name}
            <Badge color="gray" variant="soft" highContrast radius="full" ml="1">
              {count}
            </Badge>
          </RouterLink>
        </TabNav.Link>
      ))}
    </TabNav.Root>
  );
}
