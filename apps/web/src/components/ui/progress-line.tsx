import { Flex, Progress, Text } from '@radix-ui/themes';
import { useEffect, useState } from 'react';

interface ProgressLineProps {
  /** What is under way, e.g. "Uploading gauge.csv (12 KB)". */
  label: string;
  /** From 0 to 1 when the share done is known (an upload); left out while the server works. */
  fraction?: number;
}

/** Seconds since the component appeared, counted once a second. */
function useElapsedSeconds(): number {
  const [seconds, setSeconds] = useState(0);
  useEffect(() => {
    const started = Date.now();
    const timer = setInterval(() => setSeconds(Math.floor((Date.now() - started) / 1000)), 1000);
    return () => clearInterval(timer);
  }, []);
  return seconds;
}

/**
 * A long step shown as it goes: a bar filling with an upload's share sent, or moving on its
 * own while the server works, with the time taken so far so nobody wonders if it stalled.
 */
export function ProgressLine({ label, fraction }: ProgressLineProps) {
  const seconds = useElapsedSeconds();
  const percent = fraction === undefined ? undefined : Math.round(fraction * 100);
  return (
    <Flex direction="column" gap="1" width="100%" maxWidth="28rem">
      <Flex justify="between" gap="3">
        <Text size="2" color="gray">
          {label}
        </Text>
        <Text size="2" color="gray" className="sl-number">
          {percent !== undefined ? `${percent} %` : seconds >= 2 ? `${seconds} s` : ''}
        </Text>
      </Flex>
      <Progress value={percent} aria-label={label} highContrast />
    </Flex>
  );
}
