import ReactMarkdown, { defaultUrlTransform } from 'react-markdown';
import remarkGfm from 'remark-gfm';

/** Only http(s), mailto and same-site links survive; javascript:, data: and the like become empty. */
function safeUrl(url: string): string {
  const cleaned = defaultUrlTransform(url);
  return /^(https?:|mailto:|\/|#)/i.test(cleaned) || !/^[a-z][a-z0-9+.-]*:/i.test(cleaned) ? cleaned : '';
}

/** Markdown as makers write it (GFM tables and task lists); raw HTML is dropped, never rendered. */
export function Markdown({ children, className = '' }: { children: string; className?: string }) {
  return (
    <div className={`sw-prose ${className}`}>
      <ReactMarkdown remarkPlugins={[remarkGfm]} skipHtml urlTransform={safeUrl}>
        {children}
      </ReactMarkdown>
    </div>
  );
}
