package main

import (
	"errors"

	"pierwise/geometry"
)

// checkOutput refuses an -o path pierwise will not write (a device, a
// directory, a FIFO, a read-only file, another user's file) before any work
// is done: a usage error, exit status 2. A symbolic link is followed to the
// file it names (geometry.WriteTarget).
func checkOutput(flag, path string) error {
	if _, _, err := geometry.WriteTarget(path); err != nil {
		return outputError(flag, err)
	}
	return nil
}

// writeOutput writes data to path atomically (geometry.WriteFileAtomic).
func writeOutput(flag, path string, data []byte) error {
	if err := geometry.WriteFileAtomic(path, data); err != nil {
		return outputError(flag, err)
	}
	return nil
}

func outputError(flag string, err error) error {
	var re *geometry.RefusedPathError
	if errors.As(err, &re) {
		return usagef("%s %v", flag, err)
	}
	return err
}
