package drawing

import (
	"fmt"
	"math"

	"pierwise/geometry"
	"pierwise/report"
)

// side fills the right-hand column of a wall sheet: the legend (classes or
// the stress scale), the pier table, the notes and the graphic scale.
func (s *wallSheet) side(d *doc, in WallInput, m stressMap) {
	x0 := s.sh.W - margin - sideW
	x1 := s.sh.W - margin
	top, bot := margin, s.sh.H-margin-titleH
	d.line(x0, top, x0, bot, "stroke", inkColour, "stroke-width", "0.3")
	x := x0 + 4
	w := x1 - x0 - 8
	y := top + 8
	d.open("g", "id", "legend", "font-family", fontFamily, "fill", inkColour)
	d.text(x, y, 3.4, "LEGEND", "start", "font-weight", "bold")
	y += 6
	if in.Field != nil && in.Component != NoField {
		y = s.fieldScale(d, x, y, w, in, m)
	} else {
		y = s.classes(d, x, y, w, in)
	}
	y += 2
	if in.Field == nil || in.Component == NoField {
		d.swatch(x, y, 10, 4.5, paint{Fill: solidFill})
		d.text(x+13, y+3.5, 2.5, "wall outside the leaf piers", "start")
		y += 6.5
	}
	d.swatch(x, y, 10, 4.5, paint{Fill: openingFill})
	d.text(x+13, y+3.5, 2.5, "opening (tag: name, width × height)", "start")
	y += 9
	d.close("g")
	notes := s.noteLines(in, w)
	y = s.pierTable(d, x, y, w, in, bot-26-3.1*float64(len(notes)))
	d.open("g", "id", "notes", "font-family", fontFamily, "fill", inkColour)
	y += 2
	for _, l := range notes {
		if l != "" {
			d.text(x, y, 2.3, l, "start")
		}
		y += 3.1
	}
	d.close("g")
	d.scaleBar(x, bot-14, w-12, s.sys, s.sc)
}

// classes draws the pier classes with their fills and hatches.
func (s *wallSheet) classes(d *doc, x, y, w float64, in WallInput) float64 {
	bounds, paints, head := shareBounds, sharePaints, "Leaf pier: share of the wall shear V"
	if in.Show == Ratios {
		bounds, paints, head = ratioBounds, ratioPaints, "Leaf pier: demand/capacity ratio"
	}
	d.text(x, y, 2.6, head, "start", "font-weight", "bold")
	y += 2
	if in.Show == Ratios && in.Ratio == nil {
		for _, l := range wrap("Pier design is not available yet for this drawing: demand/capacity ratios come from the pier design checks (TMS 402-22, ACI 318-19), which were not given to it. Piers are left unfilled.", 2.5, w) {
			y += 3.4
			d.text(x, y, 2.5, l, "start", "fill", "#8c2a14")
		}
		return y + 3
	}
	labels := classLabels(bounds, in.Show != Ratios)
	for i, pt := range paints {
		d.swatch(x, y, 10, 4.5, pt)
		d.text(x+13, y+3.5, 2.5, labels[i], "start")
		y += 6.5
	}
	return y
}

// fieldScale draws the stress map's colour bar with its ticks.
func (s *wallSheet) fieldScale(d *doc, x, y, w float64, in WallInput, m stressMap) float64 {
	name := "Shear stress τxy (+ along V)"
	if m.comp == Vertical {
		name = "Vertical stress σy (tension +)"
	}
	d.text(x, y, 2.6, name+", "+m.unit, "start", "font-weight", "bold")
	y += 3
	const barW, barH = 7.0, 48.0
	for k := 0; k < fieldLevels; k++ {
		// Level 0 (most negative) at the bottom.
		y0 := y + barH - float64(k+1)*barH/fieldLevels
		c := fieldColour(k)
		d.rect(x, y0, x+barW, y0+barH/fieldLevels+0.05, "fill", c, "stroke", "none")
	}
	d.rect(x, y, x+barW, y+barH, "fill", "none", "stroke", inkColour, "stroke-width", "0.25")
	for i := 0; i <= 4; i++ {
		v := m.limit * (1 - float64(i)/2)
		ty := y + float64(i)*barH/4
		d.line(x+barW, ty, x+barW+1.5, ty, "stroke", inkColour, "stroke-width", "0.2")
		d.text(x+barW+2.5, ty+0.9, 2.4, signed(v), "start")
	}
	ny := y + 4
	var notes []string
	if m.clip {
		notes = append(notes, fmt.Sprintf("Colours saturate beyond ±%s. Peak %s %s; at opening corners and where the base meets a free edge the elastic stress is singular.", trim(m.limit), trim(m.peak), m.peakPlace(in.Wall)))
	}
	notes = append(notes, fmt.Sprintf("Plane-stress model, %s elements up to %s; element-centre stresses averaged at the nodes.", in.Field.Elem, geometry.FormatLength(in.Field.Mesh, in.Wall.Units)))
	if m.unit != "psi" && m.unit != "MPa" {
		notes = append(notes, "No shear or thickness in the file: multiples of the average shear stress V/(L·t).")
	}
	for _, n := range notes {
		for _, l := range wrap(n, 2.3, w-barW-24) {
			d.text(x+barW+18, ny, 2.3, l, "start")
			ny += 3.1
		}
		ny += 1
	}
	return math.Max(y+barH, ny) + 4
}

func signed(v float64) string {
	if math.Abs(v) < 1e-12 {
		return "0"
	}
	if v > 0 {
		return "+" + trim(v)
	}
	return "−" + trim(-v)
}

func trim(v float64) string { return fmt.Sprintf("%.3g", v) }

// pierTable lists every leaf pier with its size and values; rows that do not
// fit above maxY are summarised in one line.
func (s *wallSheet) pierTable(d *doc, x, y, w float64, in WallInput, maxY float64) float64 {
	if len(in.Piers) == 0 {
		msg := "Solid wall: no openings, no piers."
		if in.NoAnswer != "" {
			msg = "No pier values: " + in.NoAnswer
		}
		d.open("g", "font-family", fontFamily, "fill", inkColour)
		for _, l := range wrap(msg, 2.5, w) {
			d.text(x, y, 2.5, l, "start")
			y += 3.4
		}
		d.close("g")
		return y + 2
	}
	u := report.UnitsFor(s.sys)
	type col struct {
		head  string
		width float64
	}
	cols := []col{{"Pier", 10}, {"L", 17}, {"h", 17}, {"h/L", 9}, {"Share", 12}}
	switch {
	case in.Show == Ratios:
		cols = append(cols, col{"D/C", 12})
	case in.HasLoad:
		cols = append(cols, col{"V " + u.Force, 15}, col{"M " + u.Moment, 18})
	}
	const fs = 2.3
	d.open("g", "id", "pier-table", "font-family", fontFamily, "fill", inkColour)
	row := func(cells []string, bold bool) {
		cx := x
		for i, c := range cols {
			anchor, tx := "end", cx+c.width-0.5
			if i == 0 {
				anchor, tx = "start", cx
			}
			kv := []string{}
			if bold {
				kv = append(kv, "font-weight", "bold")
			}
			d.text(tx, y, fs, fit(cells[i], fs, c.width), anchor, kv...)
			cx += c.width
		}
		y += 3.3
	}
	heads := make([]string, len(cols))
	for i, c := range cols {
		heads[i] = c.head
	}
	row(heads, true)
	d.line(x, y-2.4, x+w, y-2.4, "stroke", inkColour, "stroke-width", "0.2")
	for i, p := range in.Piers {
		if y > maxY && i < len(in.Piers)-1 {
			d.text(x, y, fs, fmt.Sprintf("… and %d more piers (see the text report)", len(in.Piers)-i), "start")
			y += 3.3
			break
		}
		cells := []string{p.Name, dimText(p.Rect.W(), s.sys), dimText(p.Rect.H(), s.sys),
			"–", report.SigPercent(p.Share)}
		if p.Rect.W() > 0 {
			cells[3] = fmt.Sprintf("%.2f", p.Rect.H()/p.Rect.W())
		}
		if p.Cut {
			cells[4] = "cut"
		}
		switch {
		case in.Show == Ratios:
			r := "–"
			if in.Ratio != nil {
				if v, ok := in.Ratio(p.Name); ok {
					r = fmt.Sprintf("%.2f", v)
				}
			}
			cells = append(cells, r)
		case in.HasLoad:
			cells = append(cells, report.Sig(u.ForceOf(p.Shear)), report.Sig(u.MomentOf(p.Moment)))
		}
		row(cells, false)
	}
	d.close("g")
	return y + 1
}

// noteLines says how to read the sheet, wrapped to w mm.
func (s *wallSheet) noteLines(in WallInput, w float64) []string {
	wall := in.Wall
	support := "Cantilever: fixed base, free top."
	if wall.Support == geometry.Fixed {
		support = "Fixed-fixed: fixed base, top held from rotating (dashed line)."
	}
	var notes []string
	if s.unlabelled > 0 {
		notes = append(notes, fmt.Sprintf("%d piers too small at this scale for a label are in the table only.", s.unlabelled))
	}
	moments := "Pier moments: V·h at the base of a cantilever pier, V·h/2 at each end of a fixed-fixed pier."
	if in.FE {
		moments = "Pier V at mid-height, M the larger of the bottom and top moments, each the resultant of the model's nodal forces along the section."
	}
	notes = append(notes, support+" V acts toward the right at the top.", moments)
	if wall.Units == geometry.SI {
		notes = append(notes, "Dimensions in millimetres.")
	}
	var lines []string
	for _, n := range notes {
		lines = append(lines, wrap(n, 2.3, w)...)
	}
	return lines
}
