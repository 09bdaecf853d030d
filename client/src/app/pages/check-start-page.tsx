import { CheckStart } from '@/features/checks/components/check-start';

export function CheckStartPage() {
  return <CheckStart />;
}
