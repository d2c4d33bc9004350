// Package cutlist works out one kit's cut list from a design: the wire
// blank with its marks, the feed cable and its strip lengths, the
// heat-shrink sleeve, the consumables and the hardware, as a plain value
// and as table rows. Lengths are mm.
package cutlist
