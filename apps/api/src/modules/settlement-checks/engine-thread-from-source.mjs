// Entry of an engine thread when the app runs from its TypeScript sources (tsx, vitest):
// a worker thread does not inherit the loader of its parent, so tsx is registered here.
import { register } from 'tsx/esm/api';

register();
const { default: runEngineInThread } = await import('./engine-thread.ts');
export default runEngineInThread;
