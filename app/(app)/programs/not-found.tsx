import { SectionNotFound } from '@/components/shell/section-not-found';

export default function NotFound() {
  return <SectionNotFound what="Program" backHref="/programs" backLabel="Back to programs" />;
}
