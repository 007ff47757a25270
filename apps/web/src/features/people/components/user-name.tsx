import { Flex, Text } from '@radix-ui/themes';
import type { ReactNode } from 'react';

interface UserNameProps {
  name: string;
  isCurrentUser: boolean;
  /** A line under the name (the e-mail, on a card). */
  children?: ReactNode;
}

export function UserName({ name, isCurrentUser, children }: UserNameProps) {
  return (
    <Flex direction="column" minWidth="0">
      <Text weight="bold">{name}</Text>
      {children}
      {isCurrentUser ? (
        <Text size="1" color="gray">
          That is you
        </Text>
      ) : null}
    </Flex>
  );
}
