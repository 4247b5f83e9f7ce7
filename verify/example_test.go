package verify_test

// Sources: the catalogue's own cases (documentation).

import (
	"fmt"

	"github.com/qultgeo/qult/verify"
)

// The verification record's summary, as the report's title block shows it.
func ExampleSummary() {
	cases, passed, failed, err := verify.Summary()
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Println(cases >= 100, passed == cases, failed)
	// Output:
	// true true 0
}
