'use client';

export { default } from '@/components/shell/section-error';
