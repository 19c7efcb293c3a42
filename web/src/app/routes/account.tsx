import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Typography from '@mui/material/Typography';
import { Page } from '@/components/layout/page';
import { ChangePasswordForm } from '@/features/account/components/change-password-form';
import { DeleteAccountCard } from '@/features/account/components/delete-account-card';
import { ProfileForm } from '@/features/account/components/profile-form';
import { AccountExportCard } from '@/features/transfer/components/account-export-card';
import { useSignedInAccount } from '@/lib/auth/use-signed-in-account';

export function AccountRoute() {
  const account = useSignedInAccount();
  return (
    <Page
      title="Account"
      intro={`Signed in as ${account.email}. Your units and time zone shape every reading, forecast and reminder.`}
    >
      <Card component="section" aria-labelledby="profile-heading">
        <CardContent sx={{ display: 'grid', gap: 2.5 }}>
          <Typography id="profile-heading" variant="h2">
            Name and units
          </Typography>
          {/* Keyed by account id: another person signing in on this tab gets a fresh form. */}
          <ProfileForm key={account.id} account={account} />
        </CardContent>
      </Card>
      <Card component="section" aria-labelledby="password-heading">
        <CardContent sx={{ display: 'grid', gap: 2.5 }}>
          <Typography id="password-heading" variant="h2">
            Password
          </Typography>
          <ChangePasswordForm email={account.email} />
        </CardContent>
      </Card>
      <AccountExportCard />
      <DeleteAccountCard key={account.id} email={account.email} teaches={account.role !== 'baker'} />
    </Page>
  );
}
