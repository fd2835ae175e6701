//go:build !unix

package geometry

import (
	"io/fs"
	"os"
)

const openNonblock = 0

func writable(string) bool { return true }

func sameOwner(fs.FileInfo) error { return nil }

func keepGroup(*os.File, fs.FileInfo) {}
