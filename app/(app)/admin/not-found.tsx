import { SectionNotFound } from '@/components/shell/section-not-found';

export default function NotFound() {
  return <SectionNotFound what="Page" backHref="/admin" backLabel="Back to admin" />;
}
