/**
 * Words of the forms: sign-in, register, and the API's own form-wide messages. The `messages` are the
 * API's English sentences as the form shows them; other languages translate them by matching these
 * (see lib/forms/schema-messages.ts). The schemas' field reasons ("must be at least 10 characters")
 * come from the shared sentence table instead, so the web and the API say them the same way.
 */
export const forms = {
  messages: {
    wrongCredentials: 'E-mail or password is wrong',
    throttled: 'Too many attempts: wait a minute and try again',
    emailTaken: 'An account with this e-mail already exists. Sign in instead.',
    somethingWrong: 'Something went wrong. Try again.',
  },
  fields: {
    email: 'E-mail',
    password: 'Password',
    name: 'Your name',
    nameHint: 'Your group sees this name.',
    newPasswordHint: 'At least {{count}} characters. A short sentence is easy to remember.',
  },
  signIn: {
    title: 'Sign in',
    intro: 'Plan your season, keep your batch log and reserve plants at the plant share.',
    submit: 'Sign in',
    pending: 'Signing in…',
    newHere: 'New to Homeground?',
    create: 'Create an account',
  },
  register: {
    title: 'Create an account',
    intro: 'An account lets you join a growing group, keep your batch log and reserve plants.',
    submit: 'Create account',
    pending: 'Creating your account…',
    haveAccount: 'Already have an account?',
    signIn: 'Sign in',
    checkTitle: 'Check your e-mail',
    checkBody:
      'We sent a message to {{email}}. Open the link in it within {{hours}} hours to finish: your account is made when you do.',
    checkElse:
      'Nothing there after a few minutes? Look in your spam folder, or send the form again. If you already have an account, the message says so.',
    again: 'Use another address',
  },
  confirm: {
    title: 'Confirming your address',
    working: 'Making your account',
    failedTitle: 'This link did not work',
    signUpAgain: 'Sign up again',
    signIn: 'Sign in',
  },
  account: {
    title: 'Your account',
    loading: 'Loading your account',
    loadError: 'Your account details did not load.',
    you: 'You',
    name: 'Name',
    email: 'E-mail',
    role: 'Role',
    roleLine: '{{title}}: {{does}}',
    joined: 'Joined',
    groups: 'Your groups',
    noGroupTitle: 'You are not in a growing group yet.',
    noGroupText: 'An organiser invites you to their group by e-mail; then the group shows up here.',
  },
} as const;
