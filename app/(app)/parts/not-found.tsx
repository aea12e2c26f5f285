import { SectionNotFound } from '@/components/shell/section-not-found';

export default function NotFound() {
  return <SectionNotFound what="Part" backHref="/parts" backLabel="Back to parts" />;
}
