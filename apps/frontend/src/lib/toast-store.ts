import { useSyncExternalStore } from 'react';

export type ToastSeverity = 'success' | 'info' | 'warning' | 'error';
export interface Toast {
  id: number;
  message: string;
  severity: ToastSeverity;
}

// A tiny store so code outside React (the query client's error hooks) can raise toasts.
let queue: readonly Toast[] = [];
let nextId = 1;
const listeners = new Set<() => void>();

function emit(): void {
  listeners.forEach((listener) => listener());
}

export const toasts = {
  show(message: string, severity: ToastSeverity = 'info'): void {
    queue = [...queue, { id: nextId++, message, severity }];
    emit();
  },
  error: (message: string) => toasts.show(message, 'error'),
  success: (message: string) => toasts.show(message, 'success'),
  dismiss(id: number): void {
    queue = queue.filter((toast) => toast.id !== id);
    emit();
  },
  subscribe(listener: () => void): () => void {
    listeners.add(listener);
    return () => listeners.delete(listener);
  },
  snapshot: (): readonly Toast[] => queue,
};

export function useToasts(): readonly Toast[] {
  return useSyncExternalStore(toasts.subscribe, toasts.snapshot, toasts.snapshot);
}
