import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { act, fireEvent, render, screen } from '@testing-library/react';
import { ToastProvider, useToast } from './toast';
import { toastLifetimeMs } from './toast-item';

function ArchiveButton() {
  const toast = useToast();
  return (
    <button
      type="button"
      onClick={() => toast.show('Oak Lane archived.', { label: 'Undo', onClick: () => {} })}
    >
      Archive
    </button>
  );
}

function showToast() {
  render(
    <ToastProvider>
      <ArchiveButton />
    </ToastProvider>,
  );
  fireEvent.click(screen.getByRole('button', { name: 'Archive' }));
  return screen.getByRole('status');
}

function advance(ms: number): void {
  act(() => {
    vi.advanceTimersByTime(ms);
  });
}

describe('toasts', () => {
  beforeEach(() => vi.useFakeTimers());
  afterEach(() => vi.useRealTimers());

  it('goes away by itself after its time', () => {
    showToast();
    advance(toastLifetimeMs - 10);
    expect(screen.queryByText('Oak Lane archived.')).not.toBeNull();
    advance(20);
    expect(screen.queryByText('Oak Lane archived.')).toBeNull();
  });

  it('waits while the pointer is on it and resumes with the time that was left', () => {
    const toast = showToast();
    advance(5000);
    fireEvent.mouseEnter(toast);
    advance(60_000);
    expect(screen.queryByText('Oak Lane archived.')).not.toBeNull();
    fireEvent.mouseLeave(toast);
    advance(toastLifetimeMs - 5000 - 10);
    expect(screen.queryByText('Oak Lane archived.')).not.toBeNull();
    advance(20);
    expect(screen.queryByText('Oak Lane archived.')).toBeNull();
  });

  it('waits while focus is on its Undo button', () => {
    showToast();
    const undo = screen.getByRole('button', { name: 'Undo' });
    act(() => undo.focus());
    advance(60_000);
    expect(screen.queryByRole('button', { name: 'Undo' })).not.toBeNull();
    act(() => undo.blur());
    advance(toastLifetimeMs + 10);
    expect(screen.queryByRole('button', { name: 'Undo' })).toBeNull();
  });
});
