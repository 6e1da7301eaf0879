package ui

import "math"

// Rect is an axis-aligned rectangle in CSS pixels: X, Y is the top-left corner.
type Rect struct {
	X float64 `json:"x"`
	Y float64 `json:"y"`
	W float64 `json:"w"`
	H float64 `json:"h"`
}

// Right is the x of the rectangle's right edge.
func (r Rect) Right() float64 { return r.X + r.W }

// Bottom is the y of the rectangle's bottom edge.
func (r Rect) Bottom() float64 { return r.Y + r.H }

// Contains reports whether the point x, y lies inside r (right and bottom
// edges excluded).
func (r Rect) Contains(x, y float64) bool {
	return x >= r.X && x < r.Right() && y >= r.Y && y < r.Bottom()
}

// Inset shrinks r by d on every side; a negative d grows it.
func (r Rect) Inset(d float64) Rect {
	return Rect{r.X + d, r.Y + d, math.Max(r.W-2*d, 0), math.Max(r.H-2*d, 0)}
}

// Overlaps reports whether r and o share any area. Rectangles that only touch
// do not overlap.
func (r Rect) Overlaps(o Rect) bool {
	return r.X < o.Right() && o.X < r.Right() && r.Y < o.Bottom() && o.Y < r.Bottom()
}

// Within reports whether r lies inside o, edges included.
func (r Rect) Within(o Rect) bool {
	return r.X >= o.X && r.Y >= o.Y && r.Right() <= o.Right() && r.Bottom() <= o.Bottom()
}

// Empty reports whether r has no area.
func (r Rect) Empty() bool { return r.W <= 0 || r.H <= 0 }

// Intersect is the part of r inside o; empty when they do not overlap.
func (r Rect) Intersect(o Rect) Rect {
	x0, y0 := max(r.X, o.X), max(r.Y, o.Y)
	x1, y1 := min(r.Right(), o.Right()), min(r.Bottom(), o.Bottom())
	if x1 <= x0 || y1 <= y0 {
		return Rect{}
	}
	return Rect{x0, y0, x1 - x0, y1 - y0}
}

// CutTop splits r into a top part of height h and the rest.
func (r Rect) CutTop(h float64) (top, rest Rect) {
	h = math.Min(math.Max(h, 0), r.H)
	return Rect{r.X, r.Y, r.W, h}, Rect{r.X, r.Y + h, r.W, r.H - h}
}

// CutBottom splits r into the rest and a bottom part of height h.
func (r Rect) CutBottom(h float64) (rest, bottom Rect) {
	h = math.Min(math.Max(h, 0), r.H)
	return Rect{r.X, r.Y, r.W, r.H - h}, Rect{r.X, r.Bottom() - h, r.W, h}
}

// CutLeft splits r into a left part of width w and the rest.
func (r Rect) CutLeft(w float64) (left, rest Rect) {
	w = math.Min(math.Max(w, 0), r.W)
	return Rect{r.X, r.Y, w, r.H}, Rect{r.X + w, r.Y, r.W - w, r.H}
}

// CutRight splits r into the rest and a right part of width w.
func (r Rect) CutRight(w float64) (rest, right Rect) {
	w = math.Min(math.Max(w, 0), r.W)
	return Rect{r.X, r.Y, r.W - w, r.H}, Rect{r.Right() - w, r.Y, w, r.H}
}
