import { fireEvent, render, screen, waitFor } from '@testing-library/react-native';
import { SignInForm } from '../../components/auth/sign-in-form';

describe('SignInForm', () => {
  it('when submitted empty, then shows a message under each field and does not submit', async () => {
    const onSubmit = jest.fn();
    render(<SignInForm onSubmit={onSubmit} submitting={false} />);

    fireEvent.press(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByText('Enter a valid e-mail address')).toBeOnTheScreen();
    expect(screen.getByText('Enter your password')).toBeOnTheScreen();
    expect(onSubmit).not.toHaveBeenCalled();
  });

  it('when filled in, then submits the trimmed, lower-cased e-mail and the password', async () => {
    const onSubmit = jest.fn();
    render(<SignInForm onSubmit={onSubmit} submitting={false} />);

    fireEvent.changeText(screen.getByLabelText('Email'), '  Fabricator@Dilato.test ');
    fireEvent.changeText(screen.getByLabelText('Password'), 'dilato-demo');
    fireEvent.press(screen.getByRole('button', { name: 'Sign in' }));

    await waitFor(() =>
      expect(onSubmit).toHaveBeenCalledWith({ email: 'fabricator@dilato.test', password: 'dilato-demo' }, undefined),
    );
  });

  it('when the server refused the sign-in, then its message is shown as an alert', () => {
    render(<SignInForm onSubmit={jest.fn()} submitting={false} failure="That e-mail and password do not match." />);

    expect(screen.getByRole('alert')).toHaveTextContent('That e-mail and password do not match.');
  });
});
