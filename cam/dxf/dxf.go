// DXF writer: ASCII drawing exchange files in millimetres.
//
// Release 12 (AC1009, the default) is the form every cutting program
// reads: a HEADER with the drawing's extents and $MEASUREMENT = 1 (metric),
// TABLES declaring the line type and the layers, and ENTITIES with CIRCLE,
// ARC, LINE and POLYLINE (VERTEX records carrying bulges). Release 2000
// (AC1015) adds what readers of that release expect: handles and owners on
// every object, subclass markers, the full set of symbol tables, model and
// paper space block records with their blocks and layouts, an OBJECTS
// section with the named-object dictionary, $INSUNITS = 4 (mm) and
// LWPOLYLINE for polylines. Text is written as outlines. The body is built
// first so the header's $HANDSEED exceeds every handle. Numbers are fixed
// point with at most nine decimals, so output is reproducible byte for
// byte.

package dxf

import (
	"bytes"
	"fmt"
	"io"
	"math"
	"strconv"
	"strings"

	"coilwright/cam/geom"
	"coilwright/cam/walk"
)

// DXFVersion selects the DXF release to write.
type DXFVersion int

const (
	// DXFR12 writes DXF release 12 (version AC1009), the default.
	DXFR12 DXFVersion = iota
	// DXFR2000 writes DXF release 2000 (version AC1015).
	DXFR2000
)

// DXFOptions tunes WriteDXF. The zero value writes Release 12.
type DXFOptions struct {
	Version DXFVersion
	// Comments are written as 999 comment lines at the top of the file, one
	// per entry, runs of white space folded to one space.
	Comments []string
}

// layerColor returns the DXF colour index (group code 62) of a layer: red
// for CUT, blue for MARK, green for TOOLPATH, white otherwise. Common practice (no published source):
// red cut, blue mark is the usual laser-shop convention.
func layerColor(name string) int {
	switch name {
	case "CUT":
		return 1
	case "MARK":
		return 5
	case "TOOLPATH":
		return 3
	}
	return 7
}

// WriteDXF writes d to w as an ASCII DXF file in millimetres. Text
// entities are outlined first. It returns an error for an entity type it
// cannot write, an invalid layer name, or a failed write.
func WriteDXF(w io.Writer, d geom.Drawing, opt DXFOptions) error {
	d, err := walk.Prepare(d)
	if err != nil {
		return err
	}
	body := &dxfWriter{r2000: opt.Version == DXFR2000, handle: 1}
	if err := body.body(d); err != nil {
		return err
	}
	head := &dxfWriter{r2000: body.r2000}
	for _, c := range opt.Comments {
		head.pair(999, strings.Join(strings.Fields(c), " "))
	}
	head.header(d.Bounds(), body.handle)
	if _, err := w.Write(head.buf.Bytes()); err != nil {
		return err
	}
	_, err = w.Write(body.buf.Bytes())
	return err
}

// dxfWriter accumulates group code/value pairs.
type dxfWriter struct {
	buf    bytes.Buffer
	r2000  bool
	handle int // next free handle

	// Handles fixed before the body is written (Release 2000 only).
	rootDict, groupDict, layoutDict, modelLayout, paperLayout string
	modelRecord, paperRecord, plotStyles, plotStyleNormal     string
}

// pair writes one group code and value.
func (dw *dxfWriter) pair(code int, value string) {
	fmt.Fprintf(&dw.buf, "%3d\n%s\n", code, value)
}

func (dw *dxfWriter) num(code int, v float64) { dw.pair(code, dxfNum(v)) }
func (dw *dxfWriter) integer(code, v int)     { dw.pair(code, strconv.Itoa(v)) }

// dxfNum formats v in fixed point with at most nine decimals and no
// negative zero.
func dxfNum(v float64) string {
	s := strings.TrimRight(strconv.FormatFloat(v, 'f', 9, 64), "0")
	if strings.HasSuffix(s, ".") {
		s += "0"
	}
	if s == "-0.0" {
		s = "0.0"
	}
	return s
}

// next returns a fresh handle in upper-case hexadecimal.
func (dw *dxfWriter) next() string {
	h := dw.handle
	dw.handle++
	return strings.ToUpper(strconv.FormatInt(int64(h), 16))
}

func (dw *dxfWriter) section(name string) {
	dw.pair(0, "SECTION")
	dw.pair(2, name)
}

func (dw *dxfWriter) endsec() { dw.pair(0, "ENDSEC") }

func (dw *dxfWriter) point(code int, p geom.Vec2) {
	dw.num(code, p.X)
	dw.num(code+10, p.Y)
	dw.num(code+20, 0)
}

// header writes the HEADER section; seed is the next free handle.
func (dw *dxfWriter) header(b geom.Box2, seed int) {
	if b.IsEmpty() {
		b = geom.Box2{}
	}
	dw.section("HEADER")
	dw.pair(9, "$ACADVER")
	if dw.r2000 {
		dw.pair(1, "AC1015")
		dw.pair(9, "$HANDSEED")
		dw.pair(5, strings.ToUpper(strconv.FormatInt(int64(seed), 16)))
		dw.pair(9, "$INSUNITS")
		dw.integer(70, 4)
	} else {
		dw.pair(1, "AC1009")
	}
	dw.pair(9, "$INSBASE")
	dw.point(10, geom.Vec2{})
	dw.pair(9, "$EXTMIN")
	dw.point(10, b.Min)
	dw.pair(9, "$EXTMAX")
	dw.point(10, b.Max)
	dw.pair(9, "$MEASUREMENT")
	dw.integer(70, 1)
	dw.endsec()
}

// body writes every section after the header, and EOF.
func (dw *dxfWriter) body(d geom.Drawing) error {
	if dw.r2000 {
		for _, h := range []*string{&dw.rootDict, &dw.groupDict, &dw.layoutDict, &dw.modelLayout, &dw.paperLayout, &dw.modelRecord, &dw.paperRecord, &dw.plotStyles, &dw.plotStyleNormal} {
			*h = dw.next()
		}
		dw.section("CLASSES")
		dw.endsec()
	}
	dw.tables(d)
	dw.blocks()
	dw.section("ENTITIES")
	if err := walk.Walk(d, dw); err != nil {
		return err
	}
	dw.endsec()
	if dw.r2000 {
		dw.objects()
	}
	dw.pair(0, "EOF")
	return nil
}

// table opens a symbol table holding n entries and returns its handle.
func (dw *dxfWriter) table(name string, n int) string {
	dw.pair(0, "TABLE")
	dw.pair(2, name)
	h := ""
	if dw.r2000 {
		h = dw.next()
		dw.pair(5, h)
		dw.pair(330, "0")
		dw.pair(100, "AcDbSymbolTable")
	}
	dw.integer(70, n)
	return h
}

// record opens a symbol table entry of the given kind and subclass.
func (dw *dxfWriter) record(kind, owner, subclass string) {
	dw.pair(0, kind)
	if dw.r2000 {
		code := 5
		if kind == "DIMSTYLE" {
			code = 105
		}
		dw.pair(code, dw.next())
		dw.pair(330, owner)
		dw.pair(100, "AcDbSymbolTableRecord")
		dw.pair(100, subclass)
	}
}

func (dw *dxfWriter) endtab() { dw.pair(0, "ENDTAB") }

// tables writes the TABLES section: line types, layers, and for Release
// 2000 the remaining symbol tables.
func (dw *dxfWriter) tables(d geom.Drawing) {
	dw.section("TABLES")
	if dw.r2000 {
		h := dw.table("VPORT", 1)
		dw.record("VPORT", h, "AcDbViewportTableRecord")
		dw.pair(2, "*Active")
		dw.integer(70, 0)
		b := d.Bounds()
		if b.IsEmpty() {
			b = geom.Box2{Max: geom.Vec2{X: 1, Y: 1}}
		}
		dw.num(10, 0)
		dw.num(20, 0)
		dw.num(11, 1)
		dw.num(21, 1)
		dw.num(12, b.Center().X)
		dw.num(22, b.Center().Y)
		dw.num(40, math.Max(b.Size().Y, b.Size().X)*1.1+1)
		dw.num(41, 1)
		dw.endtab()
	}
	ltypes := []string{"CONTINUOUS"}
	if dw.r2000 {
		ltypes = []string{"ByBlock", "ByLayer", "Continuous"}
	}
	h := dw.table("LTYPE", len(ltypes))
	for _, name := range ltypes {
		dw.record("LTYPE", h, "AcDbLinetypeTableRecord")
		dw.pair(2, name)
		dw.integer(70, 0)
		desc := ""
		if strings.EqualFold(name, "continuous") {
			desc = "Solid line"
		}
		dw.pair(3, desc)
		dw.integer(72, 65)
		dw.integer(73, 0)
		dw.num(40, 0)
	}
	dw.endtab()

	names := []string{"0"}
	for _, l := range d.Layers {
		if l.Name != "0" {
			names = append(names, l.Name)
		}
	}
	h = dw.table("LAYER", len(names))
	for _, n := range names {
		dw.record("LAYER", h, "AcDbLayerTableRecord")
		dw.pair(2, n)
		dw.integer(70, 0)
		dw.integer(62, layerColor(n))
		if dw.r2000 {
			dw.pair(6, "Continuous")
			dw.integer(370, -3)
			dw.pair(390, dw.plotStyleNormal)
		} else {
			dw.pair(6, "CONTINUOUS")
		}
	}
	dw.endtab()
	if !dw.r2000 {
		dw.endsec()
		return
	}
	h = dw.table("STYLE", 1)
	dw.record("STYLE", h, "AcDbTextStyleTableRecord")
	dw.pair(2, "Standard")
	dw.integer(70, 0)
	dw.num(40, 0)
	dw.num(41, 1)
	dw.num(50, 0)
	dw.integer(71, 0)
	dw.num(42, 2.5)
	dw.pair(3, "txt")
	dw.pair(4, "")
	dw.endtab()
	dw.table("VIEW", 0)
	dw.endtab()
	dw.table("UCS", 0)
	dw.endtab()
	h = dw.table("APPID", 1)
	dw.record("APPID", h, "AcDbRegAppTableRecord")
	dw.pair(2, "ACAD")
	dw.integer(70, 0)
	dw.endtab()
	h = dw.table("DIMSTYLE", 1)
	dw.pair(100, "AcDbDimStyleTable")
	dw.integer(71, 0)
	dw.record("DIMSTYLE", h, "AcDbDimStyleTableRecord")
	dw.pair(2, "Standard")
	dw.integer(70, 0)
	dw.endtab()
	h = dw.table("BLOCK_RECORD", 2)
	for _, br := range []struct{ handle, name, layout string }{
		{dw.modelRecord, "*Model_Space", dw.modelLayout},
		{dw.paperRecord, "*Paper_Space", dw.paperLayout},
	} {
		dw.pair(0, "BLOCK_RECORD")
		dw.pair(5, br.handle)
		dw.pair(330, h)
		dw.pair(100, "AcDbSymbolTableRecord")
		dw.pair(100, "AcDbBlockTableRecord")
		dw.pair(2, br.name)
		dw.pair(340, br.layout)
	}
	dw.endtab()
	dw.endsec()
}

// blocks writes the BLOCKS section: empty model and paper space blocks for
// Release 2000, nothing for Release 12.
func (dw *dxfWriter) blocks() {
	dw.section("BLOCKS")
	if dw.r2000 {
		for _, b := range []struct{ owner, name string }{{dw.modelRecord, "*Model_Space"}, {dw.paperRecord, "*Paper_Space"}} {
			dw.pair(0, "BLOCK")
			dw.pair(5, dw.next())
			dw.pair(330, b.owner)
			dw.pair(100, "AcDbEntity")
			dw.pair(8, "0")
			dw.pair(100, "AcDbBlockBegin")
			dw.pair(2, b.name)
			dw.integer(70, 0)
			dw.point(10, geom.Vec2{})
			dw.pair(3, b.name)
			dw.pair(1, "")
			dw.pair(0, "ENDBLK")
			dw.pair(5, dw.next())
			dw.pair(330, b.owner)
			dw.pair(100, "AcDbEntity")
			dw.pair(8, "0")
			dw.pair(100, "AcDbBlockEnd")
		}
	}
	dw.endsec()
}

// entityStart writes an entity's type, handle, owner and layer.
func (dw *dxfWriter) entityStart(kind, layer string) {
	dw.pair(0, kind)
	if dw.r2000 {
		dw.pair(5, dw.next())
		dw.pair(330, dw.modelRecord)
		dw.pair(100, "AcDbEntity")
	}
	dw.pair(8, layer)
}

// subclass writes a Release 2000 subclass marker.
func (dw *dxfWriter) subclass(name string) {
	if dw.r2000 {
		dw.pair(100, name)
	}
}

// degrees converts an angle to degrees in [0, 360).
func degrees(a float64) float64 {
	d := math.Mod(a*180/math.Pi, 360)
	if d < 0 {
		d += 360
	}
	return d
}

// Circle writes a CIRCLE.
func (dw *dxfWriter) Circle(layer string, e geom.Circle) error {
	dw.entityStart("CIRCLE", layer)
	dw.subclass("AcDbCircle")
	dw.point(10, e.Center)
	dw.num(40, e.Radius)
	return nil
}

// Arc writes an ARC, its angles in degrees anticlockwise.
func (dw *dxfWriter) Arc(layer string, e geom.Arc) error {
	dw.entityStart("ARC", layer)
	dw.subclass("AcDbCircle")
	dw.point(10, e.Center)
	dw.num(40, e.Radius)
	dw.subclass("AcDbArc")
	dw.num(50, degrees(e.Start))
	dw.num(51, degrees(e.End))
	return nil
}

// Line writes a LINE.
func (dw *dxfWriter) Line(layer string, e geom.Line) error {
	dw.entityStart("LINE", layer)
	dw.subclass("AcDbLine")
	dw.point(10, e.A)
	dw.point(11, e.B)
	return nil
}

// Contour writes an LWPOLYLINE (R2000) or a POLYLINE with VERTEX records
// (R12), bulges included.
func (dw *dxfWriter) Contour(layer string, e geom.Contour) error {
	flags := 0
	if e.Closed {
		flags = 1
	}
	if dw.r2000 {
		dw.entityStart("LWPOLYLINE", layer)
		dw.subclass("AcDbPolyline")
		dw.integer(90, len(e.Vertices))
		dw.integer(70, flags)
		for _, v := range e.Vertices {
			dw.num(10, v.P.X)
			dw.num(20, v.P.Y)
			if v.Bulge != 0 {
				dw.num(42, v.Bulge)
			}
		}
		return nil
	}
	dw.entityStart("POLYLINE", layer)
	dw.integer(66, 1)
	dw.point(10, geom.Vec2{})
	dw.integer(70, flags)
	for _, v := range e.Vertices {
		dw.entityStart("VERTEX", layer)
		dw.point(10, v.P)
		if v.Bulge != 0 {
			dw.num(42, v.Bulge)
		}
	}
	dw.entityStart("SEQEND", layer)
	return nil
}

// objects writes the Release 2000 OBJECTS section: the named-object
// dictionary with the group and layout dictionaries, and the model and
// paper space layouts.
func (dw *dxfWriter) objects() {
	dw.section("OBJECTS")
	dict := func(handle, owner string, entries [][2]string) {
		dw.pair(0, "DICTIONARY")
		dw.pair(5, handle)
		dw.pair(330, owner)
		dw.pair(100, "AcDbDictionary")
		dw.integer(281, 1)
		for _, e := range entries {
			dw.pair(3, e[0])
			dw.pair(350, e[1])
		}
	}
	dict(dw.rootDict, "0", [][2]string{{"ACAD_GROUP", dw.groupDict}, {"ACAD_LAYOUT", dw.layoutDict}, {"ACAD_PLOTSTYLENAME", dw.plotStyles}})
	dict(dw.groupDict, dw.rootDict, nil)
	dict(dw.layoutDict, dw.rootDict, [][2]string{{"Layout1", dw.paperLayout}, {"Model", dw.modelLayout}})
	// Plot style names: layers point at the default "Normal" placeholder.
	dw.pair(0, "ACDBDICTIONARYWDFLT")
	dw.pair(5, dw.plotStyles)
	dw.pair(330, dw.rootDict)
	dw.pair(100, "AcDbDictionary")
	dw.integer(281, 1)
	dw.pair(3, "Normal")
	dw.pair(350, dw.plotStyleNormal)
	dw.pair(100, "AcDbDictionaryWithDefault")
	dw.pair(340, dw.plotStyleNormal)
	dw.pair(0, "ACDBPLACEHOLDER")
	dw.pair(5, dw.plotStyleNormal)
	dw.pair(330, dw.plotStyles)
	for _, l := range []struct {
		handle, name, record string
		order                int
	}{{dw.modelLayout, "Model", dw.modelRecord, 0}, {dw.paperLayout, "Layout1", dw.paperRecord, 1}} {
		dw.pair(0, "LAYOUT")
		dw.pair(5, l.handle)
		dw.pair(330, dw.layoutDict)
		dw.pair(100, "AcDbPlotSettings")
		dw.pair(1, "")
		dw.pair(2, "none_device")
		dw.pair(4, "")
		dw.pair(6, "")
		for _, c := range []int{40, 41, 42, 43, 44, 45, 46, 47, 48, 49, 140, 141} {
			dw.num(c, 0)
		}
		dw.num(142, 1)
		dw.num(143, 1)
		dw.integer(70, 688)
		dw.integer(72, 1) // plot paper units: millimetres
		dw.integer(73, 0)
		dw.integer(74, 5)
		dw.pair(7, "")
		dw.integer(75, 16)
		dw.num(147, 1)
		dw.num(148, 0)
		dw.num(149, 0)
		dw.pair(100, "AcDbLayout")
		dw.pair(1, l.name)
		dw.integer(70, 1)
		dw.integer(71, l.order)
		dw.num(10, 0)
		dw.num(20, 0)
		dw.num(11, 420)
		dw.num(21, 297)
		dw.point(12, geom.Vec2{})
		dw.point(14, geom.Vec2{})
		dw.point(15, geom.Vec2{})
		dw.num(146, 0)
		dw.point(13, geom.Vec2{})
		dw.point(16, geom.Vec2{X: 1})
		dw.point(17, geom.Vec2{Y: 1})
		dw.integer(76, 0)
		dw.pair(330, l.record)
	}
	dw.endsec()
}
