import { act, fireEvent, render, screen } from '@testing-library/react-native';
import { UserRow } from '../../components/users/user-row';
import { ApiError } from '../../hooks/api-client';
import type { ManagedUser } from '../../shared/schemas/users';

const dana: ManagedUser = {
  id: 'u-dana',
  email: 'dana@example.test',
  name: 'Dana Smith',
  role: 'fabricator',
  active: true,
  createdAt: '2025-01-01T00:00:00.000Z',
};

describe('UserRow', () => {
  it('when the admin deactivates a user, then it asks for active: false', async () => {
    const onUpdate = jest.fn().mockResolvedValue(undefined);
    render(<UserRow user={dana} isSelf={false} onUpdate={onUpdate} />);

    await act(async () => {
      fireEvent.press(screen.getByRole('button', { name: 'Deactivate Dana Smith' }));
    });

    expect(onUpdate).toHaveBeenCalledWith({ active: false });
  });

  it('when a role change is refused, then the server message shows in the row', async () => {
    const onUpdate = jest
      .fn()
      .mockRejectedValue(new ApiError('invalid', 'Dilato needs at least one active admin.', 400, 'last_admin'));
    render(<UserRow user={{ ...dana, role: 'admin' }} isSelf={false} onUpdate={onUpdate} />);

    fireEvent.press(screen.getByRole('button', { name: 'Change role for Dana Smith' }));
    fireEvent.press(screen.getByRole('radio', { name: 'Sales' }));
    await act(async () => {
      fireEvent.press(screen.getByRole('button', { name: 'Save role for Dana Smith' }));
    });

    expect(await screen.findByRole('alert')).toHaveTextContent('Dilato needs at least one active admin.');
    expect(onUpdate).toHaveBeenCalledWith({ role: 'sales' });
  });

  it('when the row is the admin themself, then there is no deactivate button', () => {
    render(<UserRow user={{ ...dana, role: 'admin' }} isSelf onUpdate={jest.fn()} />);

    expect(screen.queryByRole('button', { name: 'Deactivate Dana Smith' })).toBeNull();
    expect(screen.getByText('Dana Smith (you)')).toBeOnTheScreen();
  });
});
