import { Component, type ErrorInfo, type ReactNode } from "react";

export type ErrorBoundaryProps = {
  /** What to show instead of the children after they throw; gets the error and a retry. */
  fallback: (error: Error, retry: () => void) => ReactNode;
  children: ReactNode;
  onError?: (error: Error, info: ErrorInfo) => void;
};

/** Keeps one panel's failure (a chart, the 3D canvas) from taking the whole page down. */
export class ErrorBoundary extends Component<ErrorBoundaryProps, { error: Error | null }> {
  override state: { error: Error | null } = { error: null };

  static getDerivedStateFromError(error: Error) {
    return { error };
  }

  override componentDidCatch(error: Error, info: ErrorInfo) {
    this.props.onError?.(error, info);
  }

  retry = () => this.setState({ error: null });

  override render() {
    return this.state.error ? this.props.fallback(this.state.error, this.retry) : this.props.children;
  }
}
