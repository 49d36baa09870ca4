import { Tab, Tabs } from '@mui/material';
import { Link, Navigate, Route, Routes, useLocation } from 'react-router-dom';
import { PageHeader } from '../../../components/ui/states';
import { AuditPanel } from './audit-panel';
import { MailPanel } from './mail-panel';
import { ProfilesPanel } from './profiles-panel';
import { SitesPanel } from './sites-panel';
import { UsersPanel } from './users-panel';

const tabs = [
  { path: 'users', label: 'Users', element: <UsersPanel /> },
  { path: 'sites', label: 'Sites & units', element: <SitesPanel /> },
  { path: 'profiles', label: 'Protocol profiles', element: <ProfilesPanel /> },
  { path: 'audit', label: 'Audit log', element: <AuditPanel /> },
  { path: 'mail', label: 'Mail', element: <MailPanel /> },
];

/** Admin: users, sites and units, protocol profiles, audit log and mail, one tab each. */
export function AdminPage() {
  const { pathname } = useLocation();
  const current = tabs.find((t) => pathname.split('/')[2] === t.path)?.path ?? false;
  return (
    <>
      <PageHeader title="Admin" />
      <Tabs
        value={current}
        aria-label="Admin sections"
        variant="scrollable"
        allowScrollButtonsMobile
        sx={{ mb: 2, borderBottom: 1, borderColor: 'divider' }}
      >
        {tabs.map((t) => (
          <Tab
            key={t.path}
            value={t.path}
            label={t.label}
            component={Link}
            to={`/admin/${t.path}`}
            sx={{ minHeight: 48 }}
          />
        ))}
      </Tabs>
      <Routes>
        <Route index element={<Navigate to="/admin/users" replace />} />
        {tabs.map((t) => (
          <Route key={t.path} path={t.path} element={t.element} />
        ))}
        <Route path="*" element={<Navigate to="/admin/users" replace />} />
      </Routes>
    </>
  );
}
