import { SectionNotFound } from '@/components/shell/section-not-found';

export default function NotFound() {
  return <SectionNotFound what="Review" backHref="/reviews" backLabel="Back to reviews" />;
}
