import { Menu } from 'antd';
import type { MenuProps } from 'antd';
import { ExperimentOutlined, LoginOutlined } from '@ant-design/icons';
import { useLocation, useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';

const items: Required<MenuProps>['items'] = [
  { key: paths.home.href(), icon: <ExperimentOutlined />, label: 'Workbench' },
  { key: paths.signIn.href(), icon: <LoginOutlined />, label: 'Sign in' },
];

/** The narrow rail on the left: one entry per area of the product. */
export function NavRail() {
  const location = useLocation();
  const navigate = useNavigate();
  const selected = items
    .map((item) => String(item?.key))
    .filter(
      (key) => key === location.pathname || (key !== '/' && location.pathname.startsWith(key)),
    );

  return (
    <nav aria-label="Main">
      <Menu
        mode="inline"
        selectedKeys={selected}
        items={items}
        onClick={({ key }) => void navigate(key)}
      />
    </nav>
  );
}
