import { SectionLoading } from '@/components/shell/section-loading';

export default function Loading() {
  return <SectionLoading label="programs" />;
}
