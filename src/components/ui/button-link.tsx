import { Link, type LinkProps } from 'react-router';
import { buttonClass, type ButtonVariant } from './button';

/** A router link that looks like a button. */
export function ButtonLink({ variant = 'primary', className = '', ...rest }: LinkProps & { variant?: ButtonVariant }) {
  return <Link className={buttonClass(variant, className)} {...rest} />;
}
