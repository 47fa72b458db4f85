import { Card } from '@demandscape/ui';
import { useNavigate } from 'react-router';
import { PageHeader } from '../../../components/layouts/page-header';
import { paths } from '../../../config/paths';
import { useMe } from '../../../features/auth/api/get-me';
import { CreateOrganizationForm } from '../../../features/organizations/components/create-organization-form';

/** First stop for a user without an organization: create one (or wait for an invitation). */
export default function WelcomeRoute() {
  const navigate = useNavigate();
  const me = useMe();
  const hasOrganizations = (me.data?.memberships.length ?? 0) > 0;
  return (
    <div className="mx-auto max-w-lg">
      <PageHeader
        title={hasOrganizations ? 'Create another organization' : `Welcome${me.data ? `, ${me.data.user.name}` : ''}`}
        description={
          hasOrganizations
            ? 'Each organization has its own members, workspaces and credits.'
            : 'Create an organization for your team; you will be its owner. Workspaces, members and credits belong to an organization.'
        }
      />
      <Card className="p-6">
        <CreateOrganizationForm onCreated={(organization) => navigate(paths.org.workspaces.getHref(organization.id))} />
      </Card>
    </div>
  );
}
