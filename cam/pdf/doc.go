// Package pdf lays out and writes PDF documents: flowing documents of
// headings, paragraphs, tables and figures, 1:1 template pages of drawings
// tiled over paper with a scale bar, and the writer that makes their bytes
// reproducible (pinned creation date and font order).
package pdf
