package ui

import (
	"math"
	"sort"
)

// SliderEvent is what a Slider's Update did.
type SliderEvent int

// Slider events.
const (
	SliderIdle    SliderEvent = iota // nothing
	SliderRedraw                     // hover or grip changed, the value did not
	SliderMoved                      // the value changed while dragging
	SliderDropped                    // the drag ended; Moved tells whether the value changed
)

// Slider is the state of a knob on a track that sets a value from a ladder
// of stops, evenly spaced on the track: a few numbers people play with span
// orders of magnitude (events per hour from 0 to hundreds), so equal steps
// of the knob are equal steps on the ladder, not in value. A value between
// stops places the knob between them. Keys go to the typed field beside it.
type Slider struct {
	Stops    []float64 // ascending
	Value    float64
	Track    Rect // placed by the form's layout
	Dragging bool
	Moved    bool // the value changed during this drag
	Hover    bool
}

// Pos is where v sits along the track, 0 to 1.
func (s *Slider) Pos(v float64) float64 {
	n := len(s.Stops)
	if n < 2 {
		return 0
	}
	if v <= s.Stops[0] {
		return 0
	}
	if v >= s.Stops[n-1] {
		return 1
	}
	i := sort.SearchFloat64s(s.Stops, v) // Stops[i-1] < v <= Stops[i]
	a, b := s.Stops[i-1], s.Stops[i]
	return (float64(i-1) + (v-a)/(b-a)) / float64(n-1)
}

// StopAt is the stop nearest to position f (0 to 1) along the track.
func (s *Slider) StopAt(f float64) float64 {
	n := len(s.Stops)
	i := int(math.Round(math.Min(math.Max(f, 0), 1) * float64(n-1)))
	return s.Stops[i]
}

// KnobX is the knob's centre.
func (s *Slider) KnobX() float64 {
	return s.Track.X + s.Pos(s.Value)*s.Track.W
}

// grab is how far around the track a press still takes the knob, CSS px.
const grab = 6

// Hit reports whether x, y is on the track or its knob.
func (s *Slider) Hit(x, y float64) bool {
	r := Rect{s.Track.X - grab, s.Track.Y - grab, s.Track.W + 2*grab, s.Track.H + 2*grab}
	return r.Contains(x, y)
}

// Update follows the pointer: a press on the track jumps the knob there and
// starts a drag; moving with the button held drags it; letting go ends it.
func (s *Slider) Update(in *Input) SliderEvent {
	if !s.Dragging {
		ev := SliderIdle
		if h := s.Hit(in.MouseX, in.MouseY); h != s.Hover {
			s.Hover, ev = h, SliderRedraw
		}
		if in.Pressed && s.Hover {
			s.Dragging, s.Moved = true, false
			if s.follow(in.MouseX) {
				return SliderMoved
			}
			return SliderRedraw
		}
		return ev
	}
	moved := s.follow(in.MouseX)
	if in.Released || !in.Down {
		s.Dragging = false
		return SliderDropped
	}
	if moved {
		return SliderMoved
	}
	return SliderIdle
}

// follow sets the value to the stop under x; it reports a change.
func (s *Slider) follow(x float64) bool {
	if s.Track.W <= 0 {
		return false
	}
	v := s.StopAt((x - s.Track.X) / s.Track.W)
	if v == s.Value {
		return false
	}
	s.Value, s.Moved = v, true
	return true
}

// drawSlider paints the track, the filled part up to the knob, and the knob.
func drawSlider(p *Painter, s *Slider, th Theme) {
	pal := th.Palette
	cy := s.Track.Y + s.Track.H/2
	kx := s.KnobX()
	p.Fill(Rect{s.Track.X, cy - 2, s.Track.W, 4}, pal.Rule)
	p.Fill(Rect{s.Track.X, cy - 2, kx - s.Track.X, 4}, pal.Mean)
	r := 7.0
	if s.Dragging || s.Hover {
		r = 8
	}
	p.Dot(kx, cy, r, pal.Mean)
	p.Dot(kx, cy, r-3, pal.Panel)
}
