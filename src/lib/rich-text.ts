/**
 * Typography for rich text written with the rich-text editor, both while editing and where it is
 * shown (tour descriptions, record notes): the base styles reset lists and headings, so they are
 * given back here.
 */
export const richTextClasses =
  'max-w-prose space-y-3 [&_a]:text-moss [&_a]:underline [&_blockquote]:border-l-4 [&_blockquote]:border-rule [&_blockquote]:pl-4 ' +
  '[&_blockquote]:italic [&_code]:rounded [&_code]:bg-bark-wash [&_code]:px-1 [&_code]:font-mono [&_code]:text-sm [&_h2]:text-xl ' +
  '[&_h3]:text-lg [&_h4]:font-bold [&_hr]:border-rule [&_li]:my-1 [&_ol]:list-decimal [&_ol]:pl-6 [&_pre]:overflow-x-auto ' +
  '[&_pre]:rounded-md [&_pre]:bg-bark-wash [&_pre]:p-3 [&_ul]:list-disc [&_ul]:pl-6';
