/** How guide text is laid out, however it is drawn. */
export const MARKDOWN_CLASSES = "space-y-2 [&_a]:underline [&_ol]:list-decimal [&_ol]:pl-6 [&_ul]:list-disc [&_ul]:pl-6";
