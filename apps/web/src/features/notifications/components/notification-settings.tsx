import { Button, Card, Flex, Heading, Skeleton, Text } from '@radix-ui/themes';
import type { NotificationKind, NotificationSettingsView } from '@skyledger/contracts';
import { useState } from 'react';
import { CheckboxField } from '@/components/ui/checkbox-field';
import { FormError } from '@/components/ui/form-error';
import { useShowNotice } from '@/components/ui/toaster';
import { errorMessage } from '@/lib/api-error-messages';
import { useNotificationSettings } from '../api/get-notification-settings';
import { useUpdateNotificationSettings } from '../api/update-notification-settings';

function SettingsForm({ settings }: { settings: NotificationSettingsView }) {
  const update = useUpdateNotificationSettings();
  const [enabled, setEnabled] = useState<Record<string, boolean>>(() =>
    Object.fromEntries(settings.kinds.map(({ kind, enabled }) => [kind, enabled])),
  );
  const showNotice = useShowNotice();
  const save = () => {
    const disabled = settings.kinds
      .map(({ kind }) => kind)
      .filter((kind): kind is NotificationKind => !enabled[kind]);
    update.mutate(
      { disabled },
      {
        onSuccess: () => showNotice({ tone: 'success', text: 'Your choice of mails is saved.' }),
      },
    );
  };
  return (
    <form
      aria-label="Mails the desk sends you"
      noValidate
      onSubmit={(event) => {
        event.preventDefault();
        save();
      }}
    >
      <Flex direction="column" gap="3">
        <FormError message={update.isError ? errorMessage(update.error) : undefined} />
        {settings.kinds.map(({ kind, label }) => (
          <CheckboxField
            key={kind}
            name={kind}
            label={label}
            checked={enabled[kind] ?? false}
            onCheckedChange={(checked) => setEnabled((now) => ({ ...now, [kind]: checked }))}
          />
        ))}
        <Flex>
          <Button type="submit" highContrast loading={update.isPending}>
            Save mail choices
          </Button>
        </Flex>
      </Flex>
    </form>
  );
}

/** A tick per kind of notification mail; the desk sends only the ones ticked. */
export function NotificationSettings() {
  const settings = useNotificationSettings();
  return (
    <Card size="3">
      <Flex direction="column" gap="3">
        <Heading as="h2" size="4">
          Mails from the desk
        </Heading>
        <Text size="2" color="gray">
          Untick what you would rather not be told by e-mail. Invitations and password resets always
          come.
        </Text>
        {settings.isPending ? (
          <Skeleton height="160px">Loading your mail choices…</Skeleton>
        ) : settings.isError ? (
          <Text color="red">Your mail choices could not load: {errorMessage(settings.error)}</Text>
        ) : (
          <SettingsForm settings={settings.data} />
        )}
      </Flex>
    </Card>
  );
}
