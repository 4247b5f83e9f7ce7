package calc

import (
	"os"
	"testing"
)

// With a downdrag section, a candidate that is the file's own pile needs
// the length the downdrag check finds for that pile (the same search
// grid), and its section is checked against the largest axial force with
// the drag load. Consistency checks of the package with itself; no
// published values are involved.
func TestCandidateWithDowndrag(t *testing.T) {
	src, err := os.ReadFile("../examples/quay-shed-downdrag.yaml")
	if err != nil {
		t.Fatal(err)
	}
	src = append(src, []byte(`
candidates:
  piles:
    - name: same pile
      section: {shape: square, width: 450 mm}
      installation: driven-high
      unit_weight: 24 kN/m3
      youngs_modulus: 35 GPa
      material: {concrete_strength: 40 MPa}
    - name: smaller pile
      section: {shape: square, width: 350 mm}
      installation: driven-high
      unit_weight: 24 kN/m3
      youngs_modulus: 35 GPa
      material: {concrete_strength: 40 MPa}
`)...)
	res, err := Parse(src)
	if err != nil {
		t.Fatal(err)
	}
	d := res.Downdrag
	if d == nil || !d.LengthFound || res.Candidates == nil {
		t.Fatalf("downdrag %+v, candidates %v", d, res.Candidates)
	}
	for _, c := range res.Candidates.Rows {
		if !c.HasDowndrag {
			t.Errorf("%s: no downdrag recorded", c.Name)
		}
		if c.Structural.Ed < c.DowndragEd || c.DowndragEd < res.Candidates.Ed {
			t.Errorf("%s: structural Ed %v, with drag %v, head %v", c.Name, c.Structural.Ed, c.DowndragEd, res.Candidates.Ed)
		}
		if c.Name != "same pile" {
			continue
		}
		if !c.Pass || c.TipDepth != d.TipDepth {
			t.Errorf("same pile: pass %v tip %v; the downdrag check's required tip %v", c.Pass, c.TipDepth, d.TipDepth)
		}
		if c.TipDepth > res.Length.TipDepth && c.Governs != "downdrag" {
			t.Errorf("same pile: governs %q, want downdrag (tip %v below the ordinary %v)", c.Governs, c.TipDepth, res.Length.TipDepth)
		}
	}
}
