// Package html writes one self-contained HTML report page from a small
// document model: sections with headings, paragraphs, tables, figures
// (inline SVG or an embedded PNG), preformatted text, lists, warnings and
// definition lists.
//
// The page needs nothing from the network: styles are inline, pictures
// are inline SVG or data: URIs, and links only point inside the page. It
// prints on A4 or Letter (figures and tables are kept whole on a page),
// keeps heading levels in order, gives tables header cells and figures
// captions and text alternatives, and writes every piece of text escaped.
// A short inline script turns a FigureSwitch into buttons that show one
// figure at a time; without it (or on paper) every figure shows.
package html
