export { tokens, OKABE_ITO } from './tokens';
export { sheet } from './sheet';
