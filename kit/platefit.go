package kit

import (
	"fmt"

	"coilwright/parts"
	"coilwright/parts/spec"
)

// checkPlate turns the reflector's collisions (holes, rod foot, washers,
// connector, strip; see parts.PlateLayout) into spec errors naming the key
// to change, so check refuses a plate whose parts would collide.
func checkPlate(d *parts.Design) error {
	cs := d.Patterns.Plate.Collisions
	if len(cs) == 0 {
		return nil
	}
	errs := make(spec.SpecErrors, len(cs))
	for i, c := range cs {
		errs[i] = plateError(d.Spec, c)
	}
	return errs
}

// plateError names the key a maker would change for one collision: a
// mounting hole's pattern, then the rod, then the connector, then the
// plate's size.
func plateError(s *spec.Spec, c parts.PlateCollision) *spec.SpecError {
	rs := &s.Reflector
	e := &spec.SpecError{Problem: c.Error()}
	switch {
	case c.A.Part == parts.PartMounting && c.B.Part == parts.PartMounting:
		e.Key, e.Value = "reflector.mounting_hole_mm", num(rs.MountingHoleMM)
		e.Fix = "use fewer or smaller mounting holes, or a larger mounting_circle_mm"
	case c.A.Part == parts.PartMounting && c.B.Part == parts.PartEdge:
		e.Key, e.Value = "reflector.mounting_circle_mm", num(rs.MountingCircle(rs.SizeMM(s.Wavelength())))
		e.Fix = "bring the mounting holes in (a smaller mounting_circle_mm) or use smaller holes"
	case c.A.Part == parts.PartMounting:
		e.Key, e.Value = "reflector.mounting_angle_deg", num(rs.MountingAngleDeg)
		e.Fix = "turn the mounting pattern (mounting_angle_deg) or change mounting_circle_mm so the holes and washers clear the feed, the rod and the strip"
	case c.A.Part == parts.PartRod:
		e.Key, e.Value = "dowel.diameter_mm", deref(s.Dowel.DiameterMM)
		e.Fix = "give a thinner rod, or omit diameter_mm to choose one that clears the feed"
	case c.A.Part == parts.PartFeed && c.B.Part == parts.PartStrip:
		e.Key, e.Value = "reflector.connector", fmt.Sprintf("%q", rs.Connector)
		e.Fix = `use connector = "coax" or "sma-bulkhead": the flange's screws sit under the matching strip`
	default:
		e.Key = "reflector.diameter_mm"
		if rs.Shape == "square" {
			e.Key = "reflector.side_mm"
		}
		e.Value = num(rs.SizeMM(s.Wavelength()))
		e.Fix = "enlarge the reflector"
	}
	e.Line = s.Line(e.Key)
	return e
}
