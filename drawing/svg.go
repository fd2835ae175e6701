package drawing

import (
	"bytes"
	"encoding/xml"
	"math"
	"strconv"
	"strings"
)

// doc writes one SVG document through encoding/xml, which escapes every
// attribute value and every text (so a title with <, & or a control
// character from a file comes out as well-formed XML: characters XML cannot
// hold become U+FFFD). Coordinates are millimetres on the sheet, rounded to
// 0.01 mm, so golden files are stable and small.
type doc struct {
	buf bytes.Buffer
	enc *xml.Encoder
	err error
}

func newDoc() *doc {
	d := &doc{}
	d.buf.WriteString(xml.Header)
	d.enc = xml.NewEncoder(&d.buf)
	d.enc.Indent("", " ")
	return d
}

func attrs(kv []string) []xml.Attr {
	if len(kv)%2 != 0 {
		panic("drawing: odd attribute list")
	}
	a := make([]xml.Attr, 0, len(kv)/2)
	for i := 0; i < len(kv); i += 2 {
		if kv[i+1] == "" {
			continue
		}
		a = append(a, xml.Attr{Name: xml.Name{Local: kv[i]}, Value: kv[i+1]})
	}
	return a
}

func (d *doc) token(t xml.Token) {
	if d.err == nil {
		d.err = d.enc.EncodeToken(t)
	}
}

// open starts an element with attributes given as name, value pairs (an
// empty value leaves the attribute out).
func (d *doc) open(name string, kv ...string) {
	d.token(xml.StartElement{Name: xml.Name{Local: name}, Attr: attrs(kv)})
}

func (d *doc) close(name string) { d.token(xml.EndElement{Name: xml.Name{Local: name}}) }

// el writes an element without content.
func (d *doc) el(name string, kv ...string) {
	d.open(name, kv...)
	d.close(name)
}

// textEl writes an element whose content is the text s.
func (d *doc) textEl(name, s string, kv ...string) {
	d.open(name, kv...)
	d.token(xml.CharData(s))
	d.close(name)
}

// bytes finishes the document.
func (d *doc) bytes() ([]byte, error) {
	if d.err == nil {
		d.err = d.enc.Flush()
	}
	if d.err != nil {
		return nil, d.err
	}
	d.buf.WriteByte('\n')
	return d.buf.Bytes(), nil
}

// num formats a sheet coordinate: millimetres to 0.01, no exponent, no -0.
func num(v float64) string {
	if math.IsNaN(v) || math.IsInf(v, 0) {
		panic("drawing: coordinate is not finite")
	}
	v = math.Round(v*100) / 100
	if v == 0 {
		return "0"
	}
	return strconv.FormatFloat(v, 'f', -1, 64)
}

// pathBuilder collects path data with rounded coordinates.
type pathBuilder struct{ b strings.Builder }

func (p *pathBuilder) move(x, y float64) { p.cmd('M', x, y) }
func (p *pathBuilder) line(x, y float64) { p.cmd('L', x, y) }
func (p *pathBuilder) closePath()        { p.b.WriteByte('Z') }
func (p *pathBuilder) cmd(c byte, x, y float64) {
	p.b.WriteByte(c)
	p.b.WriteString(num(x))
	p.b.WriteByte(' ')
	p.b.WriteString(num(y))
}

// rect adds a closed rectangle.
func (p *pathBuilder) rect(x0, y0, x1, y1 float64) {
	p.move(x0, y0)
	p.b.WriteByte('H')
	p.b.WriteString(num(x1))
	p.b.WriteByte('V')
	p.b.WriteString(num(y1))
	p.b.WriteByte('H')
	p.b.WriteString(num(x0))
	p.closePath()
}

func (p *pathBuilder) String() string { return p.b.String() }
func (p *pathBuilder) empty() bool    { return p.b.Len() == 0 }
