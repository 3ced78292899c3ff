import { describe, expect, it, vi } from 'vitest';
import { fireEvent, render, screen, within } from '@testing-library/react';
import { allowedNextStatuses } from '@seamwright/shared';
import { JobStatusActions } from './job-status-actions';

const buttonNames = () =>
  within(screen.getByRole('group', { name: 'Move the job to' }))
    .getAllByRole('button')
    .map((b) => b.textContent);

describe('JobStatusActions', () => {
  it('offers only the allowed moves of a lead, and moves forward at once', () => {
    const onMove = vi.fn();
    render(
      <JobStatusActions status="lead" allowed={allowedNextStatuses('lead')} onMove={onMove} />,
    );
    expect(buttonNames()).toEqual(['Mark estimated', 'Mark lost', 'Cancel the job']);
    fireEvent.click(screen.getByRole('button', { name: 'Mark estimated' }));
    expect(onMove).toHaveBeenCalledWith('estimated');
  });

  it('offers no way back and no cancelling once installed', () => {
    render(
      <JobStatusActions
        status="installed"
        allowed={allowedNextStatuses('installed')}
        onMove={vi.fn()}
      />,
    );
    expect(buttonNames()).toEqual(['Mark invoiced']);
  });

  it('asks before marking a job lost, and does nothing when kept', () => {
    const onMove = vi.fn();
    render(
      <JobStatusActions
        status="estimated"
        allowed={allowedNextStatuses('estimated')}
        onMove={onMove}
      />,
    );
    fireEvent.click(screen.getByRole('button', { name: 'Mark lost' }));
    const dialog = screen.getByRole('dialog', { hidden: true });
    expect(within(dialog).getByText('Mark this job lost?')).toBeTruthy();
    fireEvent.click(within(dialog).getByRole('button', { name: 'Keep it', hidden: true }));
    expect(onMove).not.toHaveBeenCalled();
    fireEvent.click(screen.getByRole('button', { name: 'Mark lost' }));
    fireEvent.click(within(dialog).getByRole('button', { name: 'Mark lost', hidden: true }));
    expect(onMove).toHaveBeenCalledWith('lost');
  });

  it('says a final status has no moves', () => {
    render(<JobStatusActions status="closed" allowed={[]} onMove={vi.fn()} />);
    expect(screen.getByText('Closed is final: no further moves.')).toBeTruthy();
    expect(screen.queryByRole('button')).toBeNull();
  });
});
