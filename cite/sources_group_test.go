package cite

import "testing"

// TestGroupSourcesComplete: the group package's sources are complete and
// their keys differ from each other and from the shared catalogue's.
func TestGroupSourcesComplete(t *testing.T) {
	shared := []Source{NIST2008, Das2019, DasGeo, Craig2012, Meyerhof1976, Vesic1977, Berezantzev1961,
		Janbu1976, Skempton1951, API2011, ONeillReese1999, Brown2010, Hannigan2016, Jaky1944,
		MayneKulhawy1982, Kulhawy1984, Burland1973, Tomlinson1957, VijayvergiyaFocht1972,
		TomlinsonWoodward2008, EN1997, AASHTO2020, Brown2018, BondHarris2008}
	seen := map[string]bool{}
	for _, s := range shared {
		seen[s.Key] = true
	}
	for _, s := range []Source{TerzaghiPeck1967, Vesic1969, GATE2023CE, Murthy2002, Newmark1935, NPTEL105101083} {
		if s.Key == "" || s.Authors == "" || s.Year == 0 || s.Title == "" || s.Publication == "" {
			t.Errorf("source %+v is incomplete", s)
		}
		if seen[s.Key] {
			t.Errorf("key %q used twice", s.Key)
		}
		seen[s.Key] = true
	}
}
