// Copying a statement for the reviewer to paste into the model. The field holding it is selected
// first, so where the page has no clipboard access the text is ready for Ctrl+C.

/** Selects `field` and puts `text` on the clipboard; true when the clipboard took it. */
export async function copyFromField(field: HTMLInputElement | HTMLTextAreaElement | undefined, text: string) {
  field?.select();
  try {
    await navigator.clipboard.writeText(text);
    return true;
  } catch {
    return false;
  }
}
