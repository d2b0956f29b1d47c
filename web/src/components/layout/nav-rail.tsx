import { Menu } from 'antd';
import type { ReactNode } from 'react';
import { useLocation, useNavigate } from 'react-router-dom';

export interface NavItem {
  href: string;
  label: string;
  icon: ReactNode;
}

/** The narrow rail on the left: one entry per area of the product the user may use. */
export function NavRail({ items }: { items: readonly NavItem[] }) {
  const location = useLocation();
  const navigate = useNavigate();
  const selected = items
    .map((item) => item.href)
    .filter(
      (href) => href === location.pathname || (href !== '/' && location.pathname.startsWith(href)),
    );
  return (
    <nav aria-label="Main">
      <Menu
        mode="inline"
        selectedKeys={selected}
        items={items.map((item) => ({ key: item.href, icon: item.icon, label: item.label }))}
        onClick={({ key }) => void navigate(key)}
      />
    </nav>
  );
}
