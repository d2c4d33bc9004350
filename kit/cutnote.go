package kit

import (
	"fmt"

	"coilwright/cam/cut"
	"coilwright/cam/geom"
)

// NoteLayer is the layer of a cut file's printed note: text for the
// person at the machine, neither cut nor marked.
const NoteLayer = "NOTE"

// noteHeightMM is the cap height of the note's text. Common practice (no
// published source): 2.5 mm is the smallest usual drawing lettering.
const noteHeightMM = 2.5

// fileDrawing returns what a part's cut files carry: the true outline on
// CUT (and marks), and with toolPath the tool-centre path on
// cut.ToolPathLayer.
func fileDrawing(nominal geom.Drawing, kerf float64, toolPath bool) (geom.Drawing, error) {
	if !toolPath {
		return nominal, nil
	}
	return cut.WithToolPath(nominal, kerf)
}

// withNote returns d with the kerf convention written under box b on
// NoteLayer, one line per text, and the box grown to hold it.
func withNote(d geom.Drawing, b geom.Box2, kerf float64, toolPath bool) (geom.Drawing, geom.Box2) {
	out := geom.Drawing{Layers: append([]geom.Layer(nil), d.Layers...)}
	lines := []string{fmt.Sprintf("CUT: true part outline, not offset for the kerf: set cutter compensation %.2f mm (half the kerf) in your CAM.", kerf/2)}
	if toolPath {
		lines = []string{"CUT: true part outline, not offset for the kerf.",
			fmt.Sprintf("TOOLPATH: tool-centre path, %.2f mm (half the kerf) outside the part and inside its holes. Cut one layer, not both.", kerf/2)}
	}
	y := b.Min.Y
	for _, l := range lines {
		y -= 2 * noteHeightMM
		out.Add(NoteLayer, geom.Text{At: geom.Vec2{X: b.Min.X, Y: y}, Height: noteHeightMM, Value: l})
	}
	b.Min.Y = y - noteHeightMM
	return out, b
}
