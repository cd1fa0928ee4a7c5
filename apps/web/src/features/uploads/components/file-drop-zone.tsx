import { useId, useRef, useState, type DragEvent } from 'react';
import { buttonClasses } from '../../../components/button';

const ACCEPT = '.csv,.xlsx,text/csv,application/vnd.openxmlformats-officedocument.spreadsheetml.sheet';

/** Drop a file here or pick one; the server checks the content, this only narrows the picker. */
export function FileDropZone({ disabled, onFile }: { disabled: boolean; onFile: (file: File) => void }) {
  const inputId = useId();
  const input = useRef<HTMLInputElement>(null);
  const [over, setOver] = useState(false);
  const onDrop = (event: DragEvent<HTMLDivElement>) => {
    event.preventDefault();
    setOver(false);
    const file = event.dataTransfer.files[0];
    if (file && !disabled) onFile(file);
  };
  return (
    <div
      onDragOver={(e) => {
        e.preventDefault();
        if (!disabled) setOver(true);
      }}
      onDragLeave={() => setOver(false)}
      onDrop={onDrop}
      data-testid="file-drop-zone"
      className={`flex flex-col items-center gap-2 rounded-md border-2 border-dashed px-6 py-8 text-center ${over ? 'border-accent-500 bg-accent-50' : 'border-slate-300 bg-white'}`}
    >
      <p className="text-sm text-slate-700">Drop a readings file (CSV or XLSX) here, or</p>
      <label htmlFor={inputId} className={`${buttonClasses('secondary', 'sm')} cursor-pointer ${disabled ? 'pointer-events-none opacity-50' : ''}`}>
        Choose a file
      </label>
      <input
        ref={input}
        id={inputId}
        type="file"
        accept={ACCEPT}
        className="sr-only"
        aria-label="Readings file to upload (CSV or XLSX)"
        disabled={disabled}
        onChange={(e) => {
          const file = e.target.files?.[0];
          if (file) onFile(file);
          if (input.current) input.current.value = '';
        }}
      />
      <p className="text-xs text-slate-500">Up to 40 MB. The original file is kept unchanged and can be downloaded again.</p>
    </div>
  );
}
