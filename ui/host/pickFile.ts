/**
 * Asks the user for one file through a hidden `<input type="file">`; resolves to `null`
 * when the dialog is dismissed (browsers that fire no `cancel` event simply never resolve,
 * which leaves the app as it was).
 */
export function pickFile(doc: Document, accept: string): Promise<File | null> {
  return new Promise((resolve) => {
    const input = doc.createElement('input');
    input.type = 'file';
    input.accept = accept;
    input.hidden = true;
    const finish = (file: File | null) => {
      input.remove();
      resolve(file);
    };
    input.addEventListener('change', () => finish(input.files?.[0] ?? null), { once: true });
    input.addEventListener('cancel', () => finish(null), { once: true });
    doc.body.append(input);
    input.click();
  });
}
