import { Component, useMemo, type ErrorInfo, type ReactNode } from 'react';
import { cx } from '../lib/ui';

/** True when the browser can create a WebGL (2 or 1) context. O(1); creates and drops a tiny canvas. */
export function hasWebGL(): boolean {
  if (typeof document === 'undefined') return false;
  try {
    const canvas = document.createElement('canvas');
    const gl = canvas.getContext('webgl2') ?? canvas.getContext('webgl');
    const ok = Boolean(gl);
    (gl as WebGLRenderingContext | null)?.getExtension('WEBGL_lose_context')?.loseContext();
    return ok;
  } catch {
    return false;
  }
}

export interface WebGLMissingNoticeProps {
  /** Extra detail, e.g. the error message from the 3D library. */
  detail?: string;
  className?: string;
  /** Shown as a "Try again" button when given. */
  onRetry?: () => void;
}

/** Explains, in place of the 3D view, that it needs WebGL and that the rest of the page still works. */
export function WebGLMissingNotice({ detail, className, onRetry }: WebGLMissingNoticeProps) {
  return (
    <div
      role="status"
      className={cx('flex h-full min-h-64 flex-col items-center justify-center gap-3 rounded-[var(--radius-card)] border border-dashed border-line-strong bg-sunken px-6 py-10 text-center', className)}
    >
      <svg aria-hidden="true" width="44" height="44" viewBox="0 0 44 44" className="text-ink-faint">
        <ellipse cx="22" cy="22" rx="18" ry="10" fill="none" stroke="currentColor" strokeWidth="2" />
        <path d="M13 22c3-3 15-3 18 0M15 20.5c3 3 11 3 14 0" fill="none" stroke="currentColor" strokeWidth="2" />
        <path d="M6 38L38 6" stroke="var(--color-danger)" strokeWidth="2.5" strokeLinecap="round" />
      </svg>
      <h2 className="text-lg font-semibold text-ink">The 3D view needs WebGL</h2>
      <p className="max-w-md text-sm text-ink-muted">
        This browser could not start WebGL, so the surface cannot be drawn here. Everything else on this page — the
        diagram’s data, lists and computations — still works. Enabling hardware acceleration or using a current
        browser usually brings the 3D view back.
      </p>
      {detail && <p className="max-w-md font-mono text-xs text-ink-faint">{detail}</p>}
      {onRetry && (
        <button type="button" className="text-sm font-medium text-accent underline underline-offset-2" onClick={onRetry}>
          Try again
        </button>
      )}
    </div>
  );
}

export interface WebGLBoundaryProps {
  children: ReactNode;
  /** Class for the notice (e.g. to match the canvas height). */
  className?: string;
  /** Rendered instead of the default notice when WebGL is missing or the 3D view throws. */
  fallback?: ReactNode;
}

interface BoundaryState {
  error: Error | null;
}

class WebGLErrorBoundary extends Component<WebGLBoundaryProps, BoundaryState> {
  override state: BoundaryState = { error: null };

  static getDerivedStateFromError(error: Error): BoundaryState {
    return { error };
  }

  override componentDidCatch(error: Error, info: ErrorInfo) {
    console.error('3D view failed', error, info.componentStack);
  }

  override render() {
    if (this.state.error) {
      return this.props.fallback ?? (
        <WebGLMissingNotice className={this.props.className} detail={this.state.error.message} onRetry={() => this.setState({ error: null })} />
      );
    }
    return this.props.children;
  }
}

/**
 * Wrap the 3D canvas in this. If the browser has no WebGL it renders the explanation instead of trying;
 * if the 3D view throws while rendering, it catches the error and shows the same explanation, so the rest
 * of the page keeps working.
 */
export function WebGLBoundary({ children, className, fallback }: WebGLBoundaryProps) {
  const available = useMemo(hasWebGL, []);
  if (!available) return <>{fallback ?? <WebGLMissingNotice className={className} />}</>;
  return (
    <WebGLErrorBoundary className={className} fallback={fallback}>
      {children}
    </WebGLErrorBoundary>
  );
}
