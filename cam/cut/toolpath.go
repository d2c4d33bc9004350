// The tool-centre path as a drawing layer of its own: the CUT layer stays
// the true part outline (what cutting software expects, applying its own
// cutter compensation), and on request the path a tool of the given kerf
// follows is added beside it on ToolPathLayer.

package cut

import (
	"fmt"

	"coilwright/cam/geom"
)

// ToolPathLayer is the layer name of the tool-centre path.
const ToolPathLayer = "TOOLPATH"

// WithToolPath returns a copy of d with a ToolPathLayer holding its CUT
// layer offset for a tool removing kerf mm (see ApplyKerf): kerf/2 outside
// outer contours and kerf/2 inside holes. d's own layers are unchanged.
func WithToolPath(d geom.Drawing, kerf float64) (geom.Drawing, error) {
	off, err := ApplyKerf(d, kerf)
	if err != nil {
		return geom.Drawing{}, err
	}
	cut, ok := off.Layer("CUT")
	if !ok {
		return geom.Drawing{}, fmt.Errorf("the drawing has no CUT layer to offset")
	}
	out := geom.Drawing{Layers: make([]geom.Layer, 0, len(d.Layers)+1)}
	for _, l := range d.Layers {
		out.Layers = append(out.Layers, geom.Layer{Name: l.Name, Entities: append([]geom.Entity(nil), l.Entities...)})
	}
	out.Layers = append(out.Layers, geom.Layer{Name: ToolPathLayer, Entities: cut.Entities})
	return out, nil
}
