// The one TextAreaField lives in components/ui; this path stays only while cabinet-card.tsx
// still imports it from here. Import '@/components/ui/text-area-field' instead.
export { TextAreaField } from '@/components/ui/text-area-field';
