package ui

import (
	"image"
	"image/color"
	"math"

	"github.com/hajimehoshi/ebiten/v2"
	"github.com/hajimehoshi/ebiten/v2/text/v2"
	"github.com/hajimehoshi/ebiten/v2/vector"
)

// Painter draws on a screen image in CSS pixels, multiplying by the device
// scale factor and snapping edges to device pixels so lines and text stay
// sharp. It is cheap; make one per frame.
type Painter struct {
	dst   *ebiten.Image
	scale float64
	fonts *Fonts
	white *ebiten.Image // a white pixel: the source for filled shapes
	vs    []ebiten.Vertex
	is    []uint16
}

// NewPainter returns a painter on dst. white is a sub-image of one opaque
// white pixel.
func NewPainter(dst *ebiten.Image, scale float64, fonts *Fonts, white *ebiten.Image) *Painter {
	return &Painter{dst: dst, scale: scale, fonts: fonts, white: white}
}

// newWhitePixel makes the 1×1 white source image (inside a 3×3 image, so
// linear sampling at its edges stays white).
func newWhitePixel() *ebiten.Image {
	img := ebiten.NewImage(3, 3)
	img.Fill(color.White)
	return img.SubImage(image.Rect(1, 1, 2, 2)).(*ebiten.Image)
}

// Clip returns a painter that draws only inside r.
func (p *Painter) Clip(r Rect) *Painter {
	c := *p
	x0, y0 := p.px(r.X), p.px(r.Y)
	x1, y1 := p.px(r.Right()), p.px(r.Bottom())
	c.dst = p.dst.SubImage(image.Rect(int(x0), int(y0), int(x1), int(y1))).(*ebiten.Image)
	return &c
}

// px converts a CSS coordinate to the nearest device pixel edge.
func (p *Painter) px(v float64) float64 { return math.Round(v * p.scale) }

// Fill paints r.
func (p *Painter) Fill(r Rect, c color.NRGBA) {
	x0, y0 := p.px(r.X), p.px(r.Y)
	x1, y1 := p.px(r.Right()), p.px(r.Bottom())
	if x1 <= x0 || y1 <= y0 {
		return
	}
	vector.DrawFilledRect(p.dst, float32(x0), float32(y0), float32(x1-x0), float32(y1-y0), c, false)
}

// Frame paints a border of width w inside r.
func (p *Painter) Frame(r Rect, w float64, c color.NRGBA) {
	p.Fill(Rect{r.X, r.Y, r.W, w}, c)
	p.Fill(Rect{r.X, r.Bottom() - w, r.W, w}, c)
	p.Fill(Rect{r.X, r.Y + w, w, r.H - 2*w}, c)
	p.Fill(Rect{r.Right() - w, r.Y + w, w, r.H - 2*w}, c)
}

// HLine paints a horizontal line of width w centred on y, at least one device
// pixel thick.
func (p *Painter) HLine(x0, x1, y, w float64, c color.NRGBA) {
	t := math.Max(math.Round(w*p.scale), 1)
	y0 := math.Round(y*p.scale - t/2)
	vector.DrawFilledRect(p.dst, float32(p.px(x0)), float32(y0), float32(p.px(x1)-p.px(x0)), float32(t), c, false)
}

// VLine paints a vertical line of width w centred on x.
func (p *Painter) VLine(x, y0, y1, w float64, c color.NRGBA) {
	t := math.Max(math.Round(w*p.scale), 1)
	x0 := math.Round(x*p.scale - t/2)
	vector.DrawFilledRect(p.dst, float32(x0), float32(p.px(y0)), float32(t), float32(p.px(y1)-p.px(y0)), c, false)
}

// DashedH paints a dashed horizontal line: dash on, gap off, from x0.
func (p *Painter) DashedH(x0, x1, y, w, dash, gap float64, c color.NRGBA) {
	for x := x0; x < x1; x += dash + gap {
		p.HLine(x, math.Min(x+dash, x1), y, w, c)
	}
}

// DashedV paints a dashed vertical line from y0 down to y1.
func (p *Painter) DashedV(x, y0, y1, w, dash, gap float64, c color.NRGBA) {
	for y := y0; y < y1; y += dash + gap {
		p.VLine(x, y, math.Min(y+dash, y1), w, c)
	}
}

// Align places text relative to its x.
type Align int

// Alignments.
const (
	AlignLeft   Align = iota // x is the left edge
	AlignRight               // x is the right edge
	AlignCenter              // x is the centre
)

// Text draws one line of s with its line box's top at y (the box is
// st.LineHeight() tall and the glyphs are centred in it).
func (p *Painter) Text(s string, st TextStyle, x, y float64, align Align, c color.NRGBA) {
	if s == "" {
		return
	}
	face := p.fonts.Face(st, p.scale)
	m := face.Metrics()
	top := math.Round(y*p.scale + (st.LineHeight()*p.scale-(m.HAscent+m.HDescent))/2)
	op := &text.DrawOptions{}
	switch align {
	case AlignRight:
		op.PrimaryAlign = text.AlignEnd
	case AlignCenter:
		op.PrimaryAlign = text.AlignCenter
	}
	op.GeoM.Translate(math.Round(x*p.scale), top)
	op.ColorScale.ScaleWithColor(c)
	text.Draw(p.dst, s, face, op)
}

// Lines draws lines of text one under the other from y.
func (p *Painter) Lines(lines []string, st TextStyle, x, y float64, c color.NRGBA) {
	for i, l := range lines {
		p.Text(l, st, x, y+float64(i)*st.LineHeight(), AlignLeft, c)
	}
}

// Band fills the area between lo and hi over xs (all CSS px, same length).
func (p *Painter) Band(xs, lo, hi []float64, c color.NRGBA) {
	p.vs, p.is = p.vs[:0], p.is[:0]
	for i := range xs {
		x := float32(xs[i] * p.scale)
		p.vs = append(p.vs,
			ebiten.Vertex{DstX: x, DstY: float32(hi[i] * p.scale)},
			ebiten.Vertex{DstX: x, DstY: float32(lo[i] * p.scale)})
		if i > 0 {
			b := uint16(2 * (i - 1))
			p.is = append(p.is, b, b+1, b+2, b+1, b+3, b+2)
		}
	}
	p.triangles(c, true)
}

// Polyline strokes the line through xs, ys with width w.
func (p *Painter) Polyline(xs, ys []float64, w float64, c color.NRGBA) {
	if len(xs) < 2 {
		return
	}
	var path vector.Path
	path.MoveTo(float32(xs[0]*p.scale), float32(ys[0]*p.scale))
	for i := 1; i < len(xs); i++ {
		path.LineTo(float32(xs[i]*p.scale), float32(ys[i]*p.scale))
	}
	p.vs, p.is = path.AppendVerticesAndIndicesForStroke(p.vs[:0], p.is[:0],
		&vector.StrokeOptions{Width: float32(w * p.scale), LineJoin: vector.LineJoinRound})
	p.triangles(c, true)
}

// Polygon fills the convex polygon through xs, ys.
func (p *Painter) Polygon(xs, ys []float64, c color.NRGBA) {
	p.vs, p.is = p.vs[:0], p.is[:0]
	for i := range xs {
		p.vs = append(p.vs, ebiten.Vertex{DstX: float32(xs[i] * p.scale), DstY: float32(ys[i] * p.scale)})
		if i >= 2 {
			p.is = append(p.is, 0, uint16(i-1), uint16(i))
		}
	}
	p.triangles(c, true)
}

// Columns fills side-by-side rectangles from xs[i] to xs[i+1], y0 to y1,
// rectangle i in colors[i], in one draw call (len(xs) = len(colors) + 1).
func (p *Painter) Columns(xs []float64, y0, y1 float64, colors []color.NRGBA) {
	p.vs, p.is = p.vs[:0], p.is[:0]
	wb := p.white.Bounds()
	sx, sy := float32(wb.Min.X)+0.5, float32(wb.Min.Y)+0.5
	top, bottom := float32(p.px(y0)), float32(p.px(y1))
	for i, c := range colors {
		if len(p.vs)+4 > 1<<16 {
			break
		}
		r, g, b, a := c.RGBA()
		x0, x1 := float32(p.px(xs[i])), float32(p.px(xs[i+1]))
		v := ebiten.Vertex{SrcX: sx, SrcY: sy, ColorR: float32(r) / 0xffff, ColorG: float32(g) / 0xffff,
			ColorB: float32(b) / 0xffff, ColorA: float32(a) / 0xffff}
		n := uint16(len(p.vs))
		for _, xy := range [4][2]float32{{x0, top}, {x1, top}, {x0, bottom}, {x1, bottom}} {
			v.DstX, v.DstY = xy[0], xy[1]
			p.vs = append(p.vs, v)
		}
		p.is = append(p.is, n, n+1, n+2, n+1, n+3, n+2)
	}
	if len(p.is) == 0 {
		return
	}
	op := &ebiten.DrawTrianglesOptions{ColorScaleMode: ebiten.ColorScaleModePremultipliedAlpha}
	p.dst.DrawTriangles(p.vs, p.is, p.white, op)
}

// Dot fills a circle of radius r centred on x, y.
func (p *Painter) Dot(x, y, r float64, c color.NRGBA) {
	const n = 16
	xs, ys := make([]float64, n), make([]float64, n)
	for i := range n {
		a := 2 * math.Pi * float64(i) / n
		xs[i], ys[i] = x+r*math.Cos(a), y+r*math.Sin(a)
	}
	p.Polygon(xs, ys, c)
}

// triangles draws p.vs and p.is in c from the white pixel.
func (p *Painter) triangles(c color.NRGBA, antialias bool) {
	if len(p.is) == 0 {
		return
	}
	r, g, b, a := c.RGBA()
	wb := p.white.Bounds()
	for i := range p.vs {
		p.vs[i].SrcX, p.vs[i].SrcY = float32(wb.Min.X)+0.5, float32(wb.Min.Y)+0.5
		p.vs[i].ColorR = float32(r) / 0xffff
		p.vs[i].ColorG = float32(g) / 0xffff
		p.vs[i].ColorB = float32(b) / 0xffff
		p.vs[i].ColorA = float32(a) / 0xffff
	}
	op := &ebiten.DrawTrianglesOptions{ColorScaleMode: ebiten.ColorScaleModePremultipliedAlpha, AntiAlias: antialias}
	p.dst.DrawTriangles(p.vs, p.is, p.white, op)
}
