// Command fetime solves one solid wall with the finite-element check and
// prints what it solved, for scripts/fe-vs-ccx.sh. With -inp it writes the
// identical model as a CalculiX input file instead of solving.
package main

import (
	"flag"
	"fmt"
	"os"
	"time"

	"pierwise/geometry"
	"pierwise/pier/fe"
)

func main() {
	length := flag.Float64("length", 20, "wall length, ft")
	height := flag.Float64("height", 10, "wall height, ft")
	mesh := flag.Float64("mesh", 1.5, "element size, in")
	element := flag.String("element", fe.ElementQ4, "element: q4 or qm6")
	inp := flag.String("inp", "", "write this CalculiX input file (CPS4) and exit")
	flag.Parse()

	w := &geometry.Wall{
		Title:     "timing wall",
		Length:    geometry.Length(*length) * geometry.Foot,
		Height:    geometry.Length(*height) * geometry.Foot,
		Thickness: 7.625 * geometry.Inch,
		Layouts:   []geometry.Layout{{Name: "main"}},
	}
	opt := fe.Options{Mesh: geometry.Length(*mesh) * geometry.Inch, Element: *element}
	if *inp != "" {
		f, err := os.Create(*inp)
		if err == nil {
			err = fe.WriteCalculix(f, w, nil, opt, "CPS4")
			if cerr := f.Close(); err == nil {
				err = cerr
			}
		}
		if err != nil {
			fmt.Fprintln(os.Stderr, "fetime:", err)
			os.Exit(1)
		}
		return
	}
	start := time.Now()
	res, err := fe.Solve(w, nil, opt)
	if err != nil {
		fmt.Fprintln(os.Stderr, "fetime:", err)
		os.Exit(1)
	}
	fmt.Printf("deflection %.6g (1/(E t)), %d elements, %d DOFs, %s, solve %v\n",
		res.Deflection, res.Elements, res.DOFs, res.Element, time.Since(start).Round(time.Millisecond))
}
