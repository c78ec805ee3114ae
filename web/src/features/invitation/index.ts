export { AcceptInvitation } from './components/accept-invitation.js';
