import { Text } from '@radix-ui/themes';
import { DateTime } from '@/components/ui/date-time';

export function LastSignIn({ at }: { at: string | null }) {
  return at ? <DateTime value={at} show="date" /> : <Text color="gray">Never</Text>;
}
