import { Flex, Select, Text, TextField } from '@radix-ui/themes';
import { useMemo, type ComponentProps, type ReactNode, type Ref } from 'react';
import { timeZoneNames } from '@/lib/zoned-time';
import { describedBy, FieldFrame } from './field-frame';
import { useFieldIds } from './use-field-ids';

interface ZonedDateTimeFieldProps {
  /** What the time is, e.g. "Seen at"; the parts are labelled "… (date and time)" and "… time zone". */
  label: string;
  /** The registered `<input type="datetime-local">` (react-hook-form's `register`). */
  localInput: Omit<ComponentProps<typeof TextField.Root>, 'id' | 'type'>;
  zone: string;
  onZoneChange: (zone: string) => void;
  zoneRef?: Ref<HTMLButtonElement>;
  hint?: ReactNode;
  localError?: string;
  zoneError?: string;
}

/**
 * A wall-clock time and the zone it was read in, side by side, so "18:05" means what
 * the person saw; the form turns the pair into an instant with its offset.
 */
export function ZonedDateTimeField({
  label,
  localInput,
  zone,
  onZoneChange,
  zoneRef,
  hint,
  localError,
  zoneError,
}: ZonedDateTimeFieldProps) {
  const localIds = useFieldIds();
  const zoneIds = useFieldIds();
  const zones = useMemo(() => timeZoneNames(zone), [zone]);
  return (
    <Flex direction="column" gap="1">
      <Flex gap="3" wrap="wrap" align="start">
        <FieldFrame ids={localIds} label={`${label} (date and time)`} error={localError}>
          <TextField.Root
            size="3"
            type="datetime-local"
            id={localIds.controlId}
            {...describedBy(localIds, undefined, localError)}
            {...localInput}
          />
        </FieldFrame>
        <FieldFrame ids={zoneIds} label={`${label}: time zone`} error={zoneError}>
          <Select.Root size="3" value={zone} onValueChange={onZoneChange}>
            <Select.Trigger
              ref={zoneRef}
              id={zoneIds.controlId}
              aria-labelledby={zoneIds.labelId}
              className="sl-zone-trigger"
              {...describedBy(zoneIds, undefined, zoneError)}
            />
            <Select.Content position="popper">
              {zones.map((name) => (
                <Select.Item key={name} value={name}>
                  {name.replaceAll('_', ' ')}
                </Select.Item>
              ))}
            </Select.Content>
          </Select.Root>
        </FieldFrame>
      </Flex>
      {hint ? (
        <Text size="1" color="gray">
          {hint}
        </Text>
      ) : null}
    </Flex>
  );
}
