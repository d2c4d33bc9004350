package html

// Document is a report page: a title, an optional subtitle line, and
// sections in order.
type Document struct {
	// Title is the page title and its one h1 heading.
	Title string
	// Subtitle is a line under the title, for example the kit name.
	Subtitle string
	// Lang is the page's language tag; empty means "en".
	Lang string
	// Sections are the h2 sections, in order. A table of contents linking
	// to each is written under the title.
	Sections []Section
	// Footer is a line at the end of the page, for example the tool
	// version.
	Footer string
}

// Section is a titled part of a Document: an h2 heading (or h3 for a
// subsection), its blocks, then its subsections. Subsections may not have
// subsections of their own.
type Section struct {
	// ID is the section's anchor; empty derives one from Title. IDs must be
	// unique in the page.
	ID          string
	Title       string
	Blocks      []Block
	Subsections []Section
}

// Block is one element of a section: Paragraph, Table, Figure,
// FigureSwitch, Preformatted, List, Warnings or Definitions.
type Block interface{ isBlock() }

// Paragraph is a paragraph of plain text.
type Paragraph struct{ Text string }

// Table is a data table with a caption and a header row. With RowHeaders
// the first cell of each row is a header cell for its row. Numeric marks
// the columns whose cells are aligned right (it may be shorter than
// Header). Rows may not have more cells than Header.
type Table struct {
	Caption    string
	Header     []string
	Rows       [][]string
	RowHeaders bool
	Numeric    []bool
}

// Figure is a picture with a caption: either SVG (a complete SVG
// document, inlined) or PNG (embedded as a data: URI), not both. Alt is
// the text alternative: required for a PNG; for an SVG without a title it
// becomes the picture's accessible name. Name labels the figure's button
// inside a FigureSwitch.
type Figure struct {
	SVG     []byte
	PNG     []byte
	Alt     string
	Caption string
	Name    string
}

// FigureSwitch is a set of figures of which a reader sees one at a time,
// chosen with buttons labelled by each figure's Name, for example two
// pattern cuts. Without scripts, and on paper, all of them show.
type FigureSwitch struct {
	Label   string
	Figures []Figure
}

// Preformatted is text shown as written, in a fixed-width font.
type Preformatted struct{ Text string }

// List is a bulleted (or, when Ordered, numbered) list of plain-text
// items.
type List struct {
	Items   []string
	Ordered bool
}

// Warnings is a list of warnings, each marked with the word "Warning" so
// that colour does not carry the meaning alone.
type Warnings struct{ Items []string }

// Definitions is a definition list of terms and their details, for
// provenance and summary facts.
type Definitions struct{ Items []Definition }

// Definition is one term and its detail.
type Definition struct{ Term, Detail string }

func (Paragraph) isBlock()    {}
func (Table) isBlock()        {}
func (Figure) isBlock()       {}
func (FigureSwitch) isBlock() {}
func (Preformatted) isBlock() {}
func (List) isBlock()         {}
func (Warnings) isBlock()     {}
func (Definitions) isBlock()  {}
