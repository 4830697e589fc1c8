/** The theme shared by every component (colours on, or none under NO_COLOR). */
import { createContext, useContext } from 'react';
import { makeTheme, type Theme } from './theme.js';

export const ThemeContext = createContext<Theme>(makeTheme({}));

export function useTheme(): Theme {
  return useContext(ThemeContext);
}
