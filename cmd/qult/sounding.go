package main

import (
	"fmt"
	"os"
	"path/filepath"

	"github.com/qultgeo/qult/calc"
)

// maxSoundingFile bounds a sounding file a calc file names (64 MiB, the
// limit of package insitu's readers).
const maxSoundingFile = 64 << 20

// filesBeside reads the files a calc file names (ground.sounding.file)
// relative to the calc file's folder. A calc file from standard input has
// no folder: nil, so that naming a file there is an error.
func filesBeside(calcFile string) calc.ReadFileFunc {
	if calcFile == "-" {
		return nil
	}
	return calc.ReadFileIn(filepath.Dir(calcFile), func(name string) ([]byte, error) {
		st, err := os.Stat(name)
		if err != nil {
			return nil, err
		}
		if st.IsDir() {
			return nil, fmt.Errorf("%s is a directory, not a sounding file", name)
		}
		if st.Size() > maxSoundingFile {
			return nil, fmt.Errorf("%s is larger than %d MiB", name, maxSoundingFile>>20)
		}
		return os.ReadFile(name)
	})
}
