import type { ComponentProps } from 'react';
import ReactMarkdown, { defaultUrlTransform } from 'react-markdown';
import remarkGfm from 'remark-gfm';

/** Only http(s), mailto and same-site links survive; javascript:, data: and the like become empty. */
function safeUrl(url: string): string {
  const cleaned = defaultUrlTransform(url);
  return /^(https?:|mailto:|\/|#)/i.test(cleaned) || !/^[a-z][a-z0-9+.-]*:/i.test(cleaned) ? cleaned : '';
}

/** A task list's tick box is read-only; its name says whether the item is done (the item's text follows it). */
function TaskBox({ node: _node, ...props }: ComponentProps<'input'> & { node?: unknown }) {
  if (props.type !== 'checkbox') return <input {...props} />;
  return <input {...props} aria-label={props.checked ? 'Done:' : 'Not done:'} />;
}

/** Markdown as makers write it (GFM tables and task lists); raw HTML is dropped, never rendered. */
export function Markdown({ children, className = '' }: { children: string; className?: string }) {
  return (
    <div className={`sw-prose ${className}`}>
      <ReactMarkdown remarkPlugins={[remarkGfm]} skipHtml urlTransform={safeUrl} components={{ input: TaskBox }}>
        {children}
      </ReactMarkdown>
    </div>
  );
}
