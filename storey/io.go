package storey

import (
	"os"

	"pierwise/geometry"
)

// File access, in one place.
var (
	readFile = geometry.ReadUserFile
	statFile = os.Stat
	loadWall = geometry.LoadFile
)
