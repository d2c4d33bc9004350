package spec

import "slices"

// Connector is a panel connector the reflector can carry, or the plain
// coax pigtail ("coax"), by its spec name.
type Connector struct {
	ID     string
	Name   string // "SMA flange jack", …
	Family string // "SMA" or "N"; empty for a pigtail
	// Mount is "flange" (four screws), "bulkhead" (a nut through a
	// D-hole) or "pigtail" (the cable passes through the plate).
	Mount string
}

// connectors lists the reflector.connector choices; Connectors hands out
// copies.
var connectors = []Connector{
	{ID: "coax", Name: "coax pigtail", Mount: "pigtail"},
	{ID: "sma-flange", Name: "SMA four-hole flange jack", Family: "SMA", Mount: "flange"},
	{ID: "sma-bulkhead", Name: "SMA bulkhead jack", Family: "SMA", Mount: "bulkhead"},
	{ID: "n-flange", Name: "N four-hole flange jack", Family: "N", Mount: "flange"},
	{ID: "n-bulkhead", Name: "N bulkhead jack", Family: "N", Mount: "bulkhead"},
}

// Connectors returns the reflector.connector choices in the order the
// reference spec lists them, a fresh copy the caller may change.
func Connectors() []Connector { return slices.Clone(connectors) }

// ConnectorByID returns the connector with the given spec name.
func ConnectorByID(id string) (Connector, bool) {
	for _, c := range connectors {
		if c.ID == id {
			return c, true
		}
	}
	return Connector{}, false
}

func connectorIDs() []string {
	ids := make([]string, len(connectors))
	for i, c := range connectors {
		ids[i] = c.ID
	}
	return ids
}
