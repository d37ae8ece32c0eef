import { createContext, useCallback, useContext, useMemo, useRef, type ReactNode } from 'react';
import { OverlayToaster, Position, type Intent, type ToastProps } from '@blueprintjs/core';

interface ToasterContextValue {
  show: (toast: ToastProps) => void;
}

const ToasterContext = createContext<ToasterContextValue | null>(null);

/**
 * One toaster for the app, rendered inside the React tree (not with OverlayToaster.create) so its
 * portal picks up the theme's dark class from the portal provider.
 */
export function ToasterProvider({ children }: { children: ReactNode }) {
  const toaster = useRef<OverlayToaster>(null);
  const show = useCallback((toast: ToastProps) => {
    toaster.current?.show({ timeout: 5000, ...toast });
  }, []);
  const value = useMemo(() => ({ show }), [show]);
  return (
    <ToasterContext.Provider value={value}>
      {children}
      <OverlayToaster ref={toaster} position={Position.TOP} maxToasts={3} />
    </ToasterContext.Provider>
  );
}

export function useToaster(): ToasterContextValue {
  const value = useContext(ToasterContext);
  if (!value) throw new Error('useToaster must be used inside <ToasterProvider>');
  return value;
}

/** Shorthand for the two toasts most screens need. */
export function useNotify() {
  const { show } = useToaster();
  return useMemo(
    () => ({
      success: (message: ReactNode) => show({ message, intent: 'success' satisfies Intent }),
      error: (message: ReactNode) => show({ message, intent: 'danger' satisfies Intent, timeout: 8000 }),
    }),
    [show],
  );
}
