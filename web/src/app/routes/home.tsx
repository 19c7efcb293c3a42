import { Page } from '@/components/layout/page';
import { NextStepsCard } from '@/features/home/components/next-steps-card';
import { SafetyCard } from '@/features/home/components/safety-card';
import { WhatPeakwiseDoes } from '@/features/home/components/what-peakwise-does';
import { greetingFor } from '@/features/home/utils/greeting';
import { useSignedInAccount } from '@/lib/auth/use-signed-in-account';

export function HomeRoute() {
  const account = useSignedInAccount();
  return (
    <Page
      title={`${greetingFor(new Date(), account.timeZone)}, ${account.displayName}`}
      documentTitle="Home"
      intro="Peakwise is your fermentation logbook: it learns how your sourdough culture behaves and tells you, ahead of time, when it will be ready."
    >
      <NextStepsCard account={account} />
      <WhatPeakwiseDoes />
      <SafetyCard />
    </Page>
  );
}
