package cite

import "testing"

// TestStructuralSourcesComplete: the structural package's sources are
// complete and their keys differ from each other and from the shared
// catalogue's.
func TestStructuralSourcesComplete(t *testing.T) {
	seen := map[string]bool{}
	for _, s := range []Source{NIST2008, Das2019, DasGeo, Craig2012, Meyerhof1976, Vesic1977, Berezantzev1961,
		Janbu1976, Skempton1951, API2011, ONeillReese1999, Brown2010, Hannigan2016, Jaky1944,
		MayneKulhawy1982, Kulhawy1984, Burland1973, Tomlinson1957, VijayvergiyaFocht1972,
		TomlinsonWoodward2008, EN1997, AASHTO2020, Brown2018, BondHarris2008} {
		seen[s.Key] = true
	}
	for _, s := range []Source{EN1992, EN1993, IBC2018, NAVFAC1986, PilingEC2Slides} {
		if s.Key == "" || s.Authors == "" || s.Year == 0 || s.Title == "" || s.Publication == "" {
			t.Errorf("source %+v is incomplete", s)
		}
		if seen[s.Key] {
			t.Errorf("key %q used twice", s.Key)
		}
		seen[s.Key] = true
	}
}
