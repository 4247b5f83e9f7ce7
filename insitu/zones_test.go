// Source of the numbers in this file: the zone boundaries ZoneOf uses
// (Robertson 2009, as the catalogue's Ic zone table checks); the test is a
// consistency check between ZoneBoundaries and ZoneOf, no published value.

package insitu

import (
	"math"
	"testing"
)

func TestZoneBoundariesMatchZoneOf(t *testing.T) {
	b := ZoneBoundaries()
	for i, x := range b {
		if i > 0 && !(x > b[i-1]) {
			t.Fatalf("boundaries %v do not increase", b)
		}
		// A boundary belongs to the finer zone below it; just above it the zone changes.
		if lo, hi := ZoneOf(x), ZoneOf(math.Nextafter(x, 10)); lo == hi {
			t.Errorf("Ic = %g: zone %v on both sides", x, lo)
		}
	}
}
