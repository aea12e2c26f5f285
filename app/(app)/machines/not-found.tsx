import { SectionNotFound } from '@/components/shell/section-not-found';

export default function NotFound() {
  return <SectionNotFound what="Machine" backHref="/machines" backLabel="Back to machines" />;
}
