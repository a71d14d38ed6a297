import { Notice } from '@/components/ui/notice';

/** Shown on every equipment and rigging screen: the demo figures are made up. */
export function ExampleValuesNote() {
  return (
    <Notice tone="warning" title="Example values">
      The demo trucks and rigging hold invented example values, not any real truck&rsquo;s. A real truck&rsquo;s values come from its manufacturer&rsquo;s documents
      (load chart, operator&rsquo;s manual, spec sheet), and a rigging item&rsquo;s rating from its own tag.
    </Notice>
  );
}
