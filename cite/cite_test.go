package cite

import "testing"

func TestShort(t *testing.T) {
	cases := []struct {
		s    Source
		want string
	}{
		{Meyerhof1976, "Meyerhof (1976)"},
		{ONeillReese1999, "O'Neill & Reese (1999)"},
		{Berezantzev1961, "Berezantzev et al. (1961)"},
		{API2011, "American Petroleum Institute (2011)"},
	}
	for _, c := range cases {
		if got := c.s.Short(); got != c.want {
			t.Errorf("Short(%s) = %q, want %q", c.s.Key, got, c.want)
		}
	}
}

func TestRefString(t *testing.T) {
	r := Ref{Source: Meyerhof1976, Where: "Fig. 5"}
	if got, want := r.String(), "Meyerhof (1976), Fig. 5"; got != want {
		t.Errorf("got %q, want %q", got, want)
	}
	if got, want := (Ref{Source: Skempton1951}).String(), "Skempton (1951)"; got != want {
		t.Errorf("got %q, want %q", got, want)
	}
}

func TestCollect(t *testing.T) {
	got := Collect(Ref{Source: Vesic1977, Where: "Eq. 1"}, Ref{Source: Jaky1944}, Ref{Source: Vesic1977, Where: "Eq. 2"})
	if len(got) != 2 || got[0].Key != Jaky1944.Key || got[1].Key != Vesic1977.Key {
		t.Errorf("Collect = %v, want jaky1944 then vesic1977", got)
	}
}

func TestCatalogueKeysUnique(t *testing.T) {
	all := []Source{NIST2008, Das2019, DasGeo, Craig2012, Meyerhof1976, Vesic1977, Berezantzev1961,
		Janbu1976, Skempton1951, API2011, ONeillReese1999, Brown2010, Hannigan2016, Jaky1944,
		MayneKulhawy1982, Kulhawy1984, Burland1973, Tomlinson1957, VijayvergiyaFocht1972,
		TomlinsonWoodward2008, EN1997, AASHTO2020, Brown2018, BondHarris2008,
		Fellenius2004, DasNSF, Bowles1982, TanFellenius2016}
	seen := map[string]bool{}
	for _, s := range all {
		if s.Key == "" || s.Authors == "" || s.Year == 0 || s.Title == "" {
			t.Errorf("source %+v is incomplete", s)
		}
		if seen[s.Key] {
			t.Errorf("key %q used twice", s.Key)
		}
		seen[s.Key] = true
	}
}
