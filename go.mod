module github.com/qultgeo/qult

go 1.26

require (
	github.com/google/go-cmp v0.7.0 // indirect
	github.com/stretchr/testify v1.12.1 // indirect
	gonum.org/v1/gonum v0.17.0 // indirect
	pgregory.net/rapid v1.3.0 // indirect
)
