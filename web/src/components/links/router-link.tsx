import { Button, Link, type ButtonProps } from '@fluentui/react-components';
import type { ReactNode } from 'react';
import { useHref, useLinkClickHandler } from 'react-router-dom';

/**
 * Fluent's Link and Button drawn as real <a href> (so open-in-new-tab and copy-link work) while a
 * plain click navigates inside the app without reloading.
 */
function useRouterAnchor(to: string) {
  const href = useHref(to);
  const onClick = useLinkClickHandler<HTMLAnchorElement>(to);
  return { href, onClick };
}

export function RouterLink({ to, children, className }: { to: string; children: ReactNode; className?: string }) {
  const anchor = useRouterAnchor(to);
  return (
    <Link href={anchor.href} onClick={anchor.onClick} className={className}>
      {children}
    </Link>
  );
}

interface RouterButtonProps {
  to: string;
  children: ReactNode;
  appearance?: ButtonProps['appearance'];
  size?: ButtonProps['size'];
  icon?: ButtonProps['icon'];
  className?: string;
}

export function RouterButton({ to, children, appearance, size, icon, className }: RouterButtonProps) {
  const anchor = useRouterAnchor(to);
  return (
    <Button
      as="a"
      href={anchor.href}
      onClick={anchor.onClick}
      appearance={appearance}
      size={size}
      icon={icon}
      className={className}
    >
      {children}
    </Button>
  );
}
