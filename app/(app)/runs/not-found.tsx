import { SectionNotFound } from '@/components/shell/section-not-found';

export default function NotFound() {
  return <SectionNotFound what="Run" backHref="/runs" backLabel="Back to runs" />;
}
