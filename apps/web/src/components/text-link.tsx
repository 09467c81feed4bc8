import { Link, type LinkProps } from 'react-router-dom';
import { cx } from '@/lib/cx';

export const textLinkClasses = 'font-semibold text-walnut underline underline-offset-2 hover:text-walnut-dark';

export function TextLink({ className, ...rest }: LinkProps) {
  return <Link className={cx(textLinkClasses, className)} {...rest} />;
}
