package cite_test

// Sources: the catalogue's own entries (documentation).

import (
	"fmt"

	"github.com/qultgeo/qult/cite"
)

// A method's reference: the source and the place in it.
func ExampleRef() {
	r := cite.Ref{Source: cite.Meyerhof1976, Where: "limiting point resistance"}
	fmt.Println(r.Source.Short())
	fmt.Println(cite.Collect(r)[0].Key)
	// Output:
	// Meyerhof (1976)
	// meyerhof1976
}
