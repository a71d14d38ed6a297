/** The placement advisor: pure code shared by the editor's Worker and `npm run advise`. */
export * from './types';
export { advise, PROPOSALS } from './advise';
export { noneBetter, truckStanding, type Standing } from './standing';
