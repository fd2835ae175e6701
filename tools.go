//go:build tools

// Package tools pins modules that packages of pierwise are about to import,
// so that go mod tidy keeps them while the work lands in steps.
package tools

import (
	_ "github.com/BurntSushi/toml"
	_ "github.com/charmbracelet/bubbles/key"
	_ "github.com/charmbracelet/bubbletea"
	_ "github.com/charmbracelet/lipgloss"
	_ "github.com/charmbracelet/x/exp/teatest"
	_ "gonum.org/v1/gonum/lapack/lapack64"
)
