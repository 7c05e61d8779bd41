/** Hand a text to the browser as a file download (`name`, MIME `type`). */
export function downloadText(name: string, text: string, type: string): void {
  const url = URL.createObjectURL(new Blob([text], { type }));
  const a = document.createElement('a');
  a.href = url;
  a.download = name;
  a.rel = 'noopener';
  document.body.append(a);
  a.click();
  a.remove();
  // Give the browser a moment to start the download before the URL goes.
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

/** Read a dropped or chosen file as text, with its name. */
export async function readFileText(file: File): Promise<{ name: string; text: string }> {
  return { name: file.name, text: await file.text() };
}
