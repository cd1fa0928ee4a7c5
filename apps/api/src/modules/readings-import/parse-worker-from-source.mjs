// Entry of a parse thread when the app runs from its TypeScript sources (tsx, vitest):
// a worker thread does not inherit the loader of its parent, so tsx is registered here.
import { register } from 'tsx/esm/api';

register();
const { default: parseInThread } = await import('./parse-worker.ts');
export default parseInThread;
