import { OutboxRunner } from '@/lib/outbox/outbox-runner';
import { AppProvider } from './provider';
import { AppRouter } from './router';

export function App() {
  return (
    <AppProvider>
      <AppRouter />
      <OutboxRunner />
    </AppProvider>
  );
}
