/** The app's key queue, for `useKeys` (one per app instance). */
import { createContext } from 'react';
import { KeyBus } from './keyBus.js';

export const KeysContext = createContext<KeyBus>(new KeyBus());
