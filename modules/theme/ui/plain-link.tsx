import { Children, cloneElement, isValidElement, type ReactElement, type ReactNode } from 'react';

// Stands in for expo-router's Link in the buyer's bundle, which has no router: the child becomes an
// <a href> (react-native-web renders a view with href as one) and the browser follows it as a page load.
export type Href = string | { pathname: string; params?: Record<string, string | number | undefined> };

function toUrl(href: Href): string {
  if (typeof href === 'string') return href;
  const query = new URLSearchParams();
  for (const [k, v] of Object.entries(href.params ?? {})) if (v !== undefined) query.set(k, String(v));
  const q = query.toString();
  return q ? `${href.pathname}?${q}` : href.pathname;
}

export function Link({ href, children }: { href: Href; asChild?: boolean; children: ReactNode }) {
  const child = Children.only(children);
  return isValidElement(child) ? cloneElement(child as ReactElement<{ href?: string }>, { href: toUrl(href) }) : null;
}
