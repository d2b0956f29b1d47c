import { Alert, Button } from 'antd';
import { Component, type ErrorInfo, type ReactNode } from 'react';

interface Props {
  /** What the panel shows, for the message: "the charts", "the files". */
  what: string;
  children: ReactNode;
}

interface State {
  error: Error | null;
}

/**
 * Keeps one failing panel from blanking the page: its error is shown in its place, with a way to
 * try again, while the rest of the page (the inputs, the results) stays usable.
 */
export class PanelBoundary extends Component<Props, State> {
  override state: State = { error: null };

  static getDerivedStateFromError(error: Error): State {
    return { error };
  }

  override componentDidCatch(error: Error, info: ErrorInfo): void {
    // The console is where a developer looks; the person sees the message below.
    console.error(`Panel "${this.props.what}" failed`, error, info.componentStack);
  }

  override render(): ReactNode {
    if (!this.state.error) return this.props.children;
    return (
      <Alert
        type="error"
        showIcon
        title={`Could not show ${this.props.what}.`}
        description={this.state.error.message}
        action={
          <Button size="small" onClick={() => this.setState({ error: null })}>
            Try again
          </Button>
        }
        style={{ marginBottom: 16 }}
      />
    );
  }
}
