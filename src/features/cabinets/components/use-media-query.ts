// The one useMediaQuery lives in lib; this path stays only while cabinet-wall-map.tsx still
// imports it from here. Import '@/lib/use-media-query' instead.
export { useMediaQuery } from '@/lib/use-media-query';
