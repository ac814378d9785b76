/** One message for an unknown e-mail and a wrong password, so the answer does not tell which. */
export const wrongCredentialsMessage = 'E-mail or password is wrong';
export const signInRequiredMessage = 'Sign in to continue';
export const sessionExpiredMessage = 'Your session has expired; sign in again';
export const accountDisabledMessage = 'This account is disabled';
export const roleRequiredMessage = 'Your account does not have the role this needs';
export const tooManyAttemptsMessage = 'Too many attempts; wait a minute and try again';
