package drawing

import (
	"fmt"
	"math"
	"time"

	"pierwise/geometry"
	"pierwise/report"
	"pierwise/storey"
)

// StoreyInput is what a storey plan shows: the storey's analysis (which
// the storey package computes) and the title block's extras.
type StoreyInput struct {
	Analysis *storey.Analysis
	Project  []Entry
	Now      time.Time
	Version  string
}

// Storey draws a storey plan to scale: the diaphragm outline, the walls with
// their names and design shears, the centre of mass, the centre of rigidity
// and the eccentricities between them, with a table of the walls.
func Storey(in StoreyInput) ([]byte, error) {
	a := in.Analysis
	if a == nil || a.Storey == nil {
		panic("drawing: Storey needs an analysis")
	}
	s := a.Storey
	sys := s.Units
	sx, sy := float64(s.Size[0]), float64(s.Size[1])
	if !(sx > 0) || !(sy > 0) {
		return nil, fmt.Errorf("the storey needs a positive plan size to be drawn")
	}
	ws := storeySheet(s)
	sh, sc, ox, oy, pw, ph := ws.sh, ws.sc, ws.ox, ws.oy, ws.ww, ws.hh
	at := ws.at
	u := report.UnitsFor(sys)

	d := newDoc()
	d.open("svg", "xmlns", "http://www.w3.org/2000/svg", "version", "1.1",
		"width", num(sh.W)+"mm", "height", num(sh.H)+"mm", "viewBox", "0 0 "+num(sh.W)+" "+num(sh.H))
	d.textEl("title", "pierwise: "+orText(s.Title, "storey plan"))
	d.rect(0, 0, sh.W, sh.H, "fill", "#ffffff")

	// The diaphragm outline and its overall dimensions.
	d.rect(ox, oy-ph, ox+pw, oy, "id", "diaphragm", "fill", "#f4f4f0", "stroke", inkColour, "stroke-width", "0.25", "stroke-dasharray", "3 1.5")
	d.open("g", "id", "dimensions", "font-family", fontFamily, "fill", inkColour)
	ws.hChain(d, []float64{0, sx}, oy+14, oy+1.5)
	ws.vChain(d, []float64{0, sy}, ox+pw+14, ox+pw+1.5)
	d.close("g")

	// Walls: a heavy bar (a filled rectangle, which every renderer draws
	// at its true width) along each wall's length (its thickness is not to
	// scale), labelled on the inner side with its name and design shear.
	d.open("g", "id", "walls", "font-family", fontFamily, "fill", inkColour)
	for i, wl := range a.Walls {
		ref := wl.Ref
		// A wall given by its rigidity is drawn when its length is given,
		// as in the text report's plan sketch.
		length := float64(ref.Length)
		if wl.Wall != nil {
			length = float64(wl.Wall.Length)
		}
		if !(length > 0) {
			continue
		}
		label := wl.Name
		value := "V = " + geometry.FormatForce(geometry.Force(wl.Design.Shear), sys)
		if ref.Direction == storey.Angled {
			// Centred on its given point, along its angle (counter-clockwise
			// from +x; the sheet's y grows downward).
			c, sn := math.Cos(ref.Angle), math.Sin(ref.Angle)
			px, py := float64(ref.At[0]), float64(ref.At[1])
			x0, y0 := at(px-length/2*c, py-length/2*sn)
			x1, y1 := at(px+length/2*c, py+length/2*sn)
			// A filled bar 1.4 mm wide, as the other walls (a polygon: every
			// renderer fills it at its true width).
			nx, ny := -(y1-y0)/math.Hypot(x1-x0, y1-y0)*0.7, (x1-x0)/math.Hypot(x1-x0, y1-y0)*0.7
			pts := fmt.Sprintf("%s,%s %s,%s %s,%s %s,%s", num(x0+nx), num(y0+ny), num(x1+nx), num(y1+ny), num(x1-nx), num(y1-ny), num(x0-nx), num(y0-ny))
			d.el("polygon", "points", pts, "fill", inkColour, "id", fmt.Sprintf("wall-%d", i+1))
			cx, cy := at(px, py)
			ly := cy + 4.4 // beside the half of the wall that runs down-left
			if c*sn < 0 {
				ly = cy - 4.4
			}
			d.text(cx+2.5, ly, 2.8, label, "start", "font-weight", "bold")
			d.text(cx+2.5, ly+3.2, 2.6, value, "start")
			continue
		}
		along := float64(s.Size[ref.Direction])
		start := (along - length) / 2
		if ref.HasStart {
			start = float64(ref.Start)
		}
		pos := float64(ref.Position)
		if ref.Direction == storey.X {
			x0, y0 := at(start, pos)
			x1, _ := at(start+length, pos)
			d.rect(x0, y0-0.7, x1, y0+0.7, "fill", inkColour, "id", fmt.Sprintf("wall-%d", i+1))
			cx := (x0 + x1) / 2
			if pos > sy/2 { // north half: label below (inside)
				d.text(cx, y0+4.4, 2.8, label, "middle", "font-weight", "bold")
				d.text(cx, y0+7.8, 2.6, value, "middle")
			} else {
				d.text(cx, y0-5.0, 2.8, label, "middle", "font-weight", "bold")
				d.text(cx, y0-1.8, 2.6, value, "middle")
			}
		} else {
			x0, y0 := at(pos, start)
			_, y1 := at(pos, start+length)
			d.rect(x0-0.7, y0, x0+0.7, y1, "fill", inkColour, "id", fmt.Sprintf("wall-%d", i+1))
			cy := (y0 + y1) / 2
			// Text reads upward along the wall, on the inner side.
			off1, off2 := -1.8, -5.0
			if pos < sx/2 {
				off1, off2 = 4.4, 7.8
			}
			lx, vx := x0+off2, x0+off1
			if pos < sx/2 {
				lx, vx = x0+off1, x0+off2
			}
			d.text(lx, cy, 2.8, label, "middle", "font-weight", "bold", "transform", "rotate(-90 "+num(lx)+" "+num(cy)+")")
			d.text(vx, cy, 2.6, value, "middle", "transform", "rotate(-90 "+num(vx)+" "+num(cy)+")")
		}
	}
	d.close("g")

	// Centre of mass, centre of rigidity and the eccentricities.
	mx, my := float64(s.MassCenter[0]), float64(s.MassCenter[1])
	cmx, cmy := at(mx, my)
	d.open("g", "id", "centres", "font-family", fontFamily, "fill", inkColour)
	if dist := a.Distribution; dist != nil {
		rx, ry := dist.CenterOfRigidity[0], dist.CenterOfRigidity[1]
		crx, cry := at(rx, ry)
		var p pathBuilder
		p.move(crx, cry)
		p.line(cmx, cry)
		p.line(cmx, cmy)
		d.el("path", "d", p.String(), "fill", "none", "stroke", inkColour, "stroke-width", "0.25", "stroke-dasharray", "1.5 1")
		crMark(d, crx, cry)
		crAnchor, crDX := "start", 3.5
		if crx < cmx {
			crAnchor, crDX = "end", -3.5
		}
		d.text(crx+crDX, cry-3, 2.6, fmt.Sprintf("CR (%.2f, %.2f) %s", u.CoordOf(rx), u.CoordOf(ry), u.Coord), crAnchor, "font-weight", "bold")
		// The eccentricities of the mass centre from the centre of
		// rigidity, under the CM's label (away from the load arrows).
		d.subText(cmx-3.5, cmy+8.6, 2.5, "e", "x", " = "+signedLength(mx-rx, sys), "end")
		d.subText(cmx-3.5, cmy+12, 2.5, "e", "y", " = "+signedLength(my-ry, sys), "end")
	}
	cmMark(d, cmx, cmy)
	d.text(cmx-3.5, cmy+5, 2.6, fmt.Sprintf("CM (%.2f, %.2f) %s", u.CoordOf(mx), u.CoordOf(my), u.Coord), "end", "font-weight", "bold")
	// The storey shear, along x and along y in turn.
	arrow(d, cmx+3, cmy, cmx+18, cmy)
	arrow(d, cmx, cmy-3, cmx, cmy-18)
	d.text(cmx+19, cmy+0.9, 2.4, "V along x", "start")
	d.text(cmx, cmy-19.5, 2.4, "V along y", "middle")
	// Axes at the plan's origin.
	arrow(d, ox-12, oy+8, ox-4, oy+8)
	arrow(d, ox-12, oy+8, ox-12, oy)
	d.text(ox-3.5, oy+9, 2.4, "x", "start")
	d.text(ox-12, oy-1.2, 2.4, "y", "middle")
	d.close("g")

	storeySide(d, ws, a)
	lines := [][2]string{
		{"File", s.Path},
		{"Storey shear", geometry.FormatForce(s.Shear, sys) + " along x and along y in turn"},
		{"Basis", storeyBasis(s)},
	}
	d.frame(sh, titleBlock{
		Title: s.Title, Drawing: "Storey plan: walls, centres, design shears",
		Lines: lines, Project: in.Project, Date: in.Now, Version: in.Version,
		Scale: sc.Name, Sheet: sh.Name, Warnings: len(a.Warnings),
	})
	d.close("svg")
	return d.bytes()
}

// storeySheet lays a storey plan out on its sheet.
func storeySheet(s *storey.Storey) *wallSheet {
	sys := s.Units
	sx, sy := float64(s.Size[0]), float64(s.Size[1])
	sh := sheetFor(sys)
	ax0, ax1 := margin+gap, sh.W-margin-sideW-gap
	ay0, ay1 := margin+gap, sh.H-margin-titleH-gap
	const left, right, top, bottom = 22.0, 30.0, 16.0, 26.0
	availW, availH := ax1-ax0-left-right, ay1-ay0-top-bottom
	sc := chooseScale(sys, sx, sy, availW, availH)
	k := 1000 / sc.Den
	pw, ph := sx*k, sy*k
	ox := ax0 + left + (availW-pw)/2
	oy := ay0 + top + (availH-ph)/2 + ph
	return &wallSheet{sh: sh, sc: sc, k: k, ox: ox, oy: oy, ww: pw, hh: ph, sys: sys}
}

func signedLength(v float64, sys geometry.System) string {
	if v < 0 {
		return "−" + dimText(-v, sys)
	}
	return dimText(v, sys)
}

// cmMark is the centre-of-mass symbol: a circle with two opposite quarters
// filled (common practice on drawings).
func cmMark(d *doc, x, y float64) {
	const r = 2.2
	d.el("circle", "cx", num(x), "cy", num(y), "r", num(r), "fill", "#ffffff", "stroke", inkColour, "stroke-width", "0.3", "id", "cm")
	var p pathBuilder
	p.move(x, y)
	p.line(x+r, y)
	p.b.WriteString("A" + num(r) + " " + num(r) + " 0 0 0 " + num(x) + " " + num(y-r) + "Z")
	p.move(x, y)
	p.line(x-r, y)
	p.b.WriteString("A" + num(r) + " " + num(r) + " 0 0 0 " + num(x) + " " + num(y+r) + "Z")
	d.el("path", "d", p.String(), "fill", inkColour)
}

// crMark is the centre-of-rigidity symbol: a square with its diagonals.
func crMark(d *doc, x, y float64) {
	const h = 1.9
	d.rect(x-h, y-h, x+h, y+h, "fill", "#ffffff", "stroke", inkColour, "stroke-width", "0.35", "id", "cr")
	var p pathBuilder
	p.move(x-h, y-h)
	p.line(x+h, y+h)
	p.move(x-h, y+h)
	p.line(x+h, y-h)
	d.el("path", "d", p.String(), "stroke", inkColour, "stroke-width", "0.25", "fill", "none")
}

// arrow draws a line with a filled head at (x1, y1).
func arrow(d *doc, x0, y0, x1, y1 float64) {
	l := math.Hypot(x1-x0, y1-y0)
	ux, uy := (x1-x0)/l, (y1-y0)/l
	var p pathBuilder
	p.move(x0, y0)
	p.line(x1-2*ux, y1-2*uy)
	d.el("path", "d", p.String(), "stroke", inkColour, "stroke-width", "0.35", "fill", "none")
	var h pathBuilder
	h.move(x1, y1)
	h.line(x1-2.4*ux-0.9*uy, y1-2.4*uy+0.9*ux)
	h.line(x1-2.4*ux+0.9*uy, y1-2.4*uy-0.9*ux)
	h.closePath()
	d.el("path", "d", h.String(), "fill", inkColour)
}

// storeySide fills the right-hand column of a storey sheet.
func storeySide(d *doc, ws *wallSheet, a *storey.Analysis) {
	sh := ws.sh
	s := a.Storey
	u := report.UnitsFor(s.Units)
	x0, x1 := sh.W-margin-sideW, sh.W-margin
	top, bot := margin, sh.H-margin-titleH
	d.line(x0, top, x0, bot, "stroke", inkColour, "stroke-width", "0.3")
	x, w := x0+4, x1-x0-8
	y := top + 8
	d.open("g", "id", "legend", "font-family", fontFamily, "fill", inkColour)
	d.text(x, y, 3.4, "LEGEND", "start", "font-weight", "bold")
	y += 7
	cmMark(d, x+3, y-1)
	d.text(x+9, y, 2.5, "CM: centre of mass, where the storey shear acts", "start")
	y += 6
	crMark(d, x+3, y-1)
	d.text(x+9, y, 2.5, "CR: centre of rigidity", "start")
	y += 6
	d.rect(x, y-1.7, x+6, y-0.3, "fill", inkColour)
	d.text(x+9, y, 2.5, "wall: name, design shear (thickness not to scale)", "start")
	y += 8
	const fs = 2.3
	cols := []struct {
		head  string
		width float64
		left  bool
	}{{"Wall", 37, true}, {"dir", 5, true}, {"R rel", 12, false}, {"direct " + u.Force, 16, false}, {"design " + u.Force, 16, false}, {"governs", 14, false}}
	cx := x
	for _, c := range cols {
		anchor, tx := "end", cx+c.width-0.5
		if c.left {
			anchor, tx = "start", cx
		}
		d.text(tx, y, fs, c.head, anchor, "font-weight", "bold")
		cx += c.width
	}
	d.line(x, y+0.9, x+w, y+0.9, "stroke", inkColour, "stroke-width", "0.2")
	y += 3.6
	dist := a.Distribution
	for _, wl := range a.Walls {
		rel := "given" // a wall given by its rigidity, as in the storey report
		if wl.Unit != nil {
			rel = report.Sig(wl.Unit.Rigidity)
		}
		dir := wl.Ref.Direction.String()
		if wl.Ref.Direction == storey.Angled {
			dir = fmt.Sprintf("%g°", wl.Ref.AngleDeg)
		}
		governs := "direct"
		if dist != nil {
			governs = storey.CaseName(dist, wl.Design.Case)
		}
		cells := []string{wl.Name, dir, rel,
			report.Sig(u.ForceOf(geometry.Force(wl.Design.Direct))), report.Sig(u.ForceOf(geometry.Force(wl.Design.Shear))), governs}
		cx := x
		for i, c := range cols {
			anchor, tx := "end", cx+c.width-0.5
			if c.left {
				anchor, tx = "start", cx
			}
			d.text(tx, y, fs, fit(cells[i], fs, c.width), anchor)
			cx += c.width
		}
		y += 3.3
	}
	y += 4
	var notes []string
	if dist != nil {
		notes = append(notes, fmt.Sprintf("Accidental eccentricity ±%.3g %% of the plan size across the load (ASCE 7-22 §12.8.4.2): ±%s for a load along x, ±%s along y.",
			100*s.Accidental, dimText(dist.AccidentalEccentricity[0], s.Units), dimText(dist.AccidentalEccentricity[1], s.Units)))
		for _, c := range dist.Cases {
			notes = append(notes, fmt.Sprintf("Case %s: e = %s.", c.Name(), signedLength(c.Eccentricity, s.Units)))
		}
	}
	switch s.Diaphragm {
	case storey.Flexible:
		notes = append(notes, "Flexible diaphragm: the eccentricities above are the rigid idealisation's, for comparison; the design shear is the wall line's tributary shear shared by rigidity within the line, and the direct column gives it too.")
	case storey.Envelope:
		notes = append(notes, "Design shear: the larger of the rigid (worst case, never below the direct shear) and the flexible (tributary) shear of each wall.")
	default:
		notes = append(notes, "Design shear: the worst case, never below the direct shear (torsion does not relieve a wall).")
	}
	if !a.Absolute {
		notes = append(notes, "Rigidities are relative × thickness: not every wall has a modulus.")
	}
	for _, n := range notes {
		for _, l := range wrap(n, 2.3, w) {
			if y > bot-26 {
				break
			}
			d.text(x, y, 2.3, l, "start")
			y += 3.1
		}
	}
	d.close("g")
	d.scaleBar(x, bot-14, w-12, s.Units, ws.sc)
}

// storeyBasis says where the walls' rigidities come from and how the
// diaphragm shares the storey shear.
func storeyBasis(s *storey.Storey) string {
	rig := "classic wall rigidities"
	if s.Basis == geometry.BasisFE {
		rig = "finite-element wall rigidities"
	}
	switch s.Diaphragm {
	case storey.Flexible:
		return rig + ", flexible diaphragm (tributary)"
	case storey.Envelope:
		return rig + ", envelope of rigid (with torsion) and flexible diaphragms"
	}
	return rig + ", rigid diaphragm with torsion"
}
