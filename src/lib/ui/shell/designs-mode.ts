/** What the designs dialog is showing. */
export type DesignsMode = 'new' | 'rename' | 'save-as' | 'list';
