import { Flex, Spinner, Text } from '@radix-ui/themes';

export function LoadingScreen({ label = 'Opening the desk…' }: { label?: string }) {
  return (
    <main aria-busy="true">
      <Flex align="center" justify="center" gap="3" minHeight="60vh">
        <Spinner size="3" />
        <Text color="gray">{label}</Text>
      </Flex>
    </main>
  );
}
