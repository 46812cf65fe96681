import { Notice } from '@/components/ui/notice';

/** Brief, once per page: why the verdict matters. */
export function BottleCaution() {
  return (
    <Notice tone="caution" title="Bottles can burst">
      Bottles filled before fermentation ends keep building pressure and can burst. Package only when the verdict says stable, use bottles made for
      carbonated drinks, and store them where a burst can hurt no one.
    </Notice>
  );
}
