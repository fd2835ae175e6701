package storey

import (
	"os"

	"pierwise/geometry"
)

// File access, in one place.
var (
	readFile = os.ReadFile
	statFile = os.Stat
	loadWall = geometry.LoadFile
)
