/** Creates a template. (Being built.) */
export function NewTemplatePage() {
  return <p>New template</p>;
}

/** Edits a template: every save makes a new version. (Being built.) */
export function EditTemplatePage() {
  return <p>Edit template</p>;
}
