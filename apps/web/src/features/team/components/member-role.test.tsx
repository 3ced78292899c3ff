import { describe, expect, it, vi } from 'vitest';
import { fireEvent, render, screen } from '@testing-library/react';
import type { MemberView } from '@seamwright/shared';
import { MemberRole } from './member-role';

const member: MemberView = {
  id: '8b1f7a52-3a43-4d0e-9a55-2f4d9d1c0e11',
  userId: '5e0c1d7a-92a1-4b0f-8d0e-0b8f3c1e2a44',
  name: 'Tamsin Orlov',
  email: 'tamsin@example.test',
  role: 'crew_lead',
  createdAt: '2026-03-02T15:00:00.000Z',
};

function select(value: string) {
  fireEvent.change(screen.getByLabelText('Role of Tamsin Orlov'), { target: { value } });
}

describe('MemberRole', () => {
  it('sends nothing while the role is being chosen, and one change on Save', () => {
    const onSave = vi.fn(() => Promise.resolve());
    render(<MemberRole member={member} isSelf={false} isSaving={false} onSave={onSave} />);

    // Arrow keys on a closed select fire a change for each role passed on the way.
    select('bookkeeper');
    select('office');
    select('owner');
    select('office');
    expect(onSave).not.toHaveBeenCalled();

    fireEvent.click(screen.getByRole('button', { name: 'Save role of Tamsin Orlov' }));
    expect(onSave).toHaveBeenCalledTimes(1);
    expect(onSave).toHaveBeenCalledWith('office');
  });

  it('offers Save only once the role differs, and Cancel puts the old role back', () => {
    const onSave = vi.fn(() => Promise.resolve());
    render(<MemberRole member={member} isSelf={false} isSaving={false} onSave={onSave} />);
    expect(screen.queryByRole('button', { name: /Save role/ })).toBeNull();

    select('office');
    fireEvent.click(
      screen.getByRole('button', { name: 'Cancel the role change for Tamsin Orlov' }),
    );
    expect(screen.getByLabelText<HTMLSelectElement>('Role of Tamsin Orlov').value).toBe(
      'crew_lead',
    );
    expect(screen.queryByRole('button', { name: /Save role/ })).toBeNull();
    expect(onSave).not.toHaveBeenCalled();
  });
});
