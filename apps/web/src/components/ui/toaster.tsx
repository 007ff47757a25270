import { CheckCircledIcon, Cross2Icon, ExclamationTriangleIcon } from '@radix-ui/react-icons';
import { Box, Flex, IconButton, Text } from '@radix-ui/themes';
import {
  createContext,
  use,
  useCallback,
  useEffect,
  useRef,
  useState,
  type ReactNode,
} from 'react';

export interface Notice {
  tone: 'success' | 'problem';
  text: string;
}

export type ShowNotice = (notice: Notice) => void;

interface Toast extends Notice {
  id: number;
}

/** Long enough to read a sentence twice on a slow day; a problem stays until dismissed. */
export const SUCCESS_TOAST_MS = 8000;
const MAX_TOASTS = 3;

const ToastContext = createContext<ShowNotice | null>(null);

/**
 * The desk's one way to say an action was saved or failed: a toast in a live region that
 * is always in the page, so screen readers announce each one. Successes fade after a
 * while (not while pointed at or focused); problems stay until closed.
 */
export function Toaster({ children }: { children: ReactNode }) {
  const [toasts, setToasts] = useState<Toast[]>([]);
  const nextId = useRef(0);
  const show = useCallback<ShowNotice>((notice) => {
    nextId.current += 1;
    const toast = { ...notice, id: nextId.current };
    // The same words again replace the old toast rather than stacking up.
    setToasts((current) =>
      [...current.filter((shown) => shown.text !== notice.text), toast].slice(-MAX_TOASTS),
    );
  }, []);
  const dismiss = useCallback((id: number) => {
    setToasts((current) => current.filter((toast) => toast.id !== id));
  }, []);

  return (
    <ToastContext value={show}>
      {children}
      <section aria-label="Notifications" className="sl-toasts">
        <Flex direction="column" gap="2" aria-live="polite">
          {toasts.map((toast) => (
            <ToastItem key={toast.id} toast={toast} onDismiss={dismiss} />
          ))}
        </Flex>
      </section>
    </ToastContext>
  );
}

function ToastItem({ toast, onDismiss }: { toast: Toast; onDismiss: (id: number) => void }) {
  const [held, setHeld] = useState(false);
  useEffect(() => {
    if (toast.tone !== 'success' || held) return;
    const timer = setTimeout(() => onDismiss(toast.id), SUCCESS_TOAST_MS);
    return () => clearTimeout(timer);
  }, [toast, held, onDismiss]);
  const success = toast.tone === 'success';
  return (
    <Flex
      role="status"
      gap="3"
      align="start"
      className="sl-toast"
      data-tone={toast.tone}
      onMouseEnter={() => setHeld(true)}
      onMouseLeave={() => setHeld(false)}
      onFocus={() => setHeld(true)}
      onBlur={() => setHeld(false)}
    >
      <Text color={success ? 'jade' : 'red'} className="sl-toast-icon">
        {success ? <CheckCircledIcon aria-hidden /> : <ExclamationTriangleIcon aria-hidden />}
      </Text>
      <Box flexGrow="1">
        <Text size="2">{toast.text}</Text>
      </Box>
      <IconButton
        size="1"
        variant="ghost"
        color="gray"
        highContrast
        aria-label="Dismiss this message"
        onClick={() => onDismiss(toast.id)}
      >
        <Cross2Icon aria-hidden />
      </IconButton>
    </Flex>
  );
}

/** Shows a toast: for what an action did, or the API's words for why it failed. */
export function useShowNotice(): ShowNotice {
  const show = use(ToastContext);
  if (!show) throw new Error('useShowNotice needs the <Toaster> of the app provider');
  return show;
}
