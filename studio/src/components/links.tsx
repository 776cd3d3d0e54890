import type { MouseEvent, ReactNode } from 'react';
import { useHref, useLinkClickHandler, type To } from 'react-router-dom';
import { Button, Link, type ButtonProps } from '@fluentui/react-components';

/** Real anchors with real hrefs (so middle-click and "copy link" work) that route without a reload. */
function useRouterAnchor(to: To) {
  const href = useHref(to);
  const handleClick = useLinkClickHandler<HTMLAnchorElement>(to);
  return { href, onClick: (event: MouseEvent<HTMLAnchorElement>) => handleClick(event) };
}

export function LinkButton({ to, ...props }: Omit<ButtonProps, 'as' | 'href' | 'onClick'> & { to: To }) {
  const anchor = useRouterAnchor(to);
  return <Button {...(props as object)} as="a" href={anchor.href} onClick={anchor.onClick} />;
}

export function TextLink({ to, children }: { to: To; children: ReactNode }) {
  const anchor = useRouterAnchor(to);
  return <Link href={anchor.href} onClick={anchor.onClick}>{children}</Link>;
}
