/**
 * Catches an error thrown while drawing a screen and shows it as one clear line, so a bug
 * in one screen never ends the app with a stack trace; switching screens clears it.
 */
import { Text } from 'ink';
import { Component, type ReactNode } from 'react';
import { errorText } from '../errorText.js';

interface Props {
  readonly children: ReactNode;
  readonly resetKey: string;
}
interface State {
  readonly error: unknown;
  readonly key: string;
}

export class ErrorBoundary extends Component<Props, State> {
  override state: State = { error: undefined, key: this.props.resetKey };

  static getDerivedStateFromError(error: unknown): Partial<State> {
    return { error: error ?? new Error('unknown error') };
  }

  static getDerivedStateFromProps(props: Props, state: State): Partial<State> | null {
    return props.resetKey !== state.key ? { error: undefined, key: props.resetKey } : null;
  }

  override render() {
    if (this.state.error !== undefined) {
      return <Text wrap="wrap">This screen stopped: {errorText(this.state.error)} (switch screens to reset it)</Text>;
    }
    return this.props.children;
  }
}
