import { isApiUnreachable, errorMessage } from '../api';
import { Alert } from './Alert';
import { Button } from './Button';

export interface QueryErrorProps {
  error: unknown;
  /** Shows a "Try again" button. */
  onRetry?: () => void;
  /** What was being loaded, e.g. "the members". */
  what?: string;
}

/** An in-place error for a failed query, distinguishing "server not answering" from other errors. */
export function QueryError({ error, onRetry, what = 'this' }: QueryErrorProps) {
  const down = isApiUnreachable(error);
  return (
    <Alert tone="error" title={down ? 'Quadrant’s server is not answering' : `Could not load ${what}`}>
      <p>{down ? 'Check your connection; the rest of the page still works.' : errorMessage(error)}</p>
      {onRetry && (
        <Button variant="secondary" size="sm" className="mt-3" onClick={onRetry}>
          Try again
        </Button>
      )}
    </Alert>
  );
}
