package profile

import "fmt"

// Soil is the kind of soil a layer is, as a borehole log names it. It is
// description only: no method reads it (drainage and the strength
// parameters decide the methods), and the ground drawing of a report shows
// it with a fill pattern and a key. The zero value, SoilUnset, means the
// log did not say.
type Soil uint8

// The kinds of soil, by the trade's main classification names.
const (
	SoilUnset Soil = iota
	Gravel         // coarse-grained, mostly gravel
	Sand           // coarse-grained, mostly sand
	Silt           // fine-grained, low plasticity
	Clay           // fine-grained, plastic
	Peat           // highly organic soil
	Fill           // made ground or fill placed by people
)

var soilIDs = [...]string{"", "gravel", "sand", "silt", "clay", "peat", "fill"}

// String returns the identifier used in calc files: "gravel", "sand",
// "silt", "clay", "peat" or "fill"; "" for SoilUnset.
func (s Soil) String() string {
	if int(s) < len(soilIDs) {
		return soilIDs[s]
	}
	return fmt.Sprintf("Soil(%d)", int(s))
}

// ParseSoil reads an identifier written by String.
func ParseSoil(id string) (Soil, error) {
	for i := 1; i < len(soilIDs); i++ {
		if soilIDs[i] == id {
			return Soil(i), nil
		}
	}
	return 0, fmt.Errorf("%q: want one of gravel, sand, silt, clay, peat, fill", id)
}
