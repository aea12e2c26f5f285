import { SectionNotFound } from '@/components/shell/section-not-found';

export default function NotFound() {
  return <SectionNotFound what="Probe" backHref="/probes" backLabel="Back to probes" />;
}
