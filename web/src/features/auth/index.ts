export { SessionProvider } from './components/session-provider.js';
export { SignInForm } from './components/sign-in-form.js';
export { RegisterForm } from './components/register-form.js';
export { ConfirmRegistration } from './components/confirm-registration.js';
export { useSession } from './hooks/use-session.js';
export type { Session, SessionStatus } from './hooks/session-context.js';
