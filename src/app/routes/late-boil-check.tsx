import { PublicCheck } from '@/features/late-boil/components/public-check';
import { RouterLink } from '@/components/ui/router-link';

export function Component() {
  return <PublicCheck Link={RouterLink} />;
}
