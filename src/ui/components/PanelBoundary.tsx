/**
 * Keeps a failure inside one region: if a panel throws while drawing, it shows what went wrong
 * and a retry button, and the rest of the workbench (and the loaded data) stays usable.
 */
import { Component, type ReactNode } from 'react';

interface Props {
  name: string;
  children: ReactNode;
}

interface State {
  error: Error | null;
}

export class PanelBoundary extends Component<Props, State> {
  override state: State = { error: null };

  static getDerivedStateFromError(error: Error): State {
    return { error };
  }

  override render() {
    if (!this.state.error) return this.props.children;
    return (
      <section className="panel" role="alert">
        <p className="error-text">The {this.props.name} region failed to draw: {this.state.error.message}</p>
        <button type="button" onClick={() => this.setState({ error: null })}>Try again</button>
      </section>
    );
  }
}
