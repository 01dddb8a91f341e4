/** Quadrant's small component kit, shared by every feature. */
export { cx } from './cx';
export { Button, ButtonLink, buttonClass, type ButtonProps, type ButtonLinkProps, type ButtonVariant, type ButtonSize } from './Button';
export { Spinner, LoadingState } from './Spinner';
export { TextField, TextAreaField, SelectField, type TextFieldProps, type TextAreaFieldProps, type SelectFieldProps } from './Field';
export { Alert, type AlertProps, type AlertTone } from './Alert';
export { ConfirmDialog, type ConfirmDialogProps } from './ConfirmDialog';
export { Card, PageHeader, EmptyState, type PageHeaderProps } from './Card';
export { RoleBadge, ROLE_LABELS } from './RoleBadge';
export { Logo, LogoMark } from './Logo';
export { QueryError, type QueryErrorProps } from './QueryError';
export { NotFoundView, type NotFoundViewProps } from './NotFoundView';
