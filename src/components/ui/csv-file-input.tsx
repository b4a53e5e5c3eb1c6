import { useId, useState } from 'react';

/** "Or load a CSV file": reads a text file in the browser (nothing is uploaded) and hands over its text; refuses files over `maxBytes`. */
export function CsvFileInput({ maxBytes, tooLarge, onText }: { maxBytes: number; tooLarge: string; onText: (text: string) => void }) {
  const id = useId();
  const [note, setNote] = useState<string | null>(null);
  const handleFile = async (file: File | undefined) => {
    if (!file) return;
    if (file.size > maxBytes) return setNote(`${file.name} is larger than ${Math.round(maxBytes / 1024 / 1024)} MB; ${tooLarge}`);
    setNote(`Reading ${file.name}…`);
    onText(await file.text());
    setNote(`Loaded ${file.name} (${(file.size / 1024).toFixed(1)} KB).`);
  };
  return (
    <div>
      <label htmlFor={id} className="block text-sm font-medium">
        Or load a CSV file
      </label>
      <input
        id={id}
        type="file"
        accept=".csv,.txt,.tsv,text/csv,text/plain"
        className="mt-1 block w-full text-sm file:mr-3 file:rounded-md file:border file:border-teal file:bg-white file:px-3 file:py-1 file:text-teal-dark"
        onChange={(e) => void handleFile(e.target.files?.[0])}
      />
      {note && (
        <p role="status" className="mt-1 text-xs text-ink-soft">
          {note}
        </p>
      )}
    </div>
  );
}
