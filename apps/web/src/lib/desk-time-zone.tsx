import { createContext, use, type ReactNode } from 'react';
import { browserTimeZone } from './zoned-time';

// The desk's own zone (DESK_TIME_ZONE on the server, handed over with the session), so
// everyone on the desk reads "10:00" on the same clock wherever their laptop is set.
const DeskTimeZoneContext = createContext<string | null>(null);

export function DeskTimeZoneProvider({
  timeZone,
  children,
}: {
  timeZone: string;
  children: ReactNode;
}) {
  return <DeskTimeZoneContext value={timeZone}>{children}</DeskTimeZoneContext>;
}

/** The desk's zone inside the signed-in frame; the browser's on pages before sign-in. */
export function useDeskTimeZone(): string {
  return use(DeskTimeZoneContext) ?? browserTimeZone();
}
