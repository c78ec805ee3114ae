export { AvailablePage } from './components/available-page.js';
export { MyReservation } from './components/my-reservation.js';
export { ShareDirectory } from './components/share-directory.js';
export { WaitlistOffer } from './components/waitlist-offer.js';
