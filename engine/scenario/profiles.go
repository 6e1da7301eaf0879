package scenario

// Profile is a node profile of ours: a complete, sensible set of node.*
// values for one kind of always-on camera node. In a scenario file,
// node.profile names one and its values fill every node field the file
// leaves out. Values follow the trade's orders of magnitude (common
// practice): always-on vision near 1 mW at a few frames per second, about
// half in the sensor and half in the digital side; an LED illuminator that
// dominates in the dark; host wakes of tens to hundreds of mJ; radio
// messages by class (REFERENCE-VALUES §8).
type Profile struct {
	ID, Name, Note string
	// Values by field path: float64, int, string, bool or []float64.
	Values map[string]any
}

// Profiles lists the built-in node profiles.
func Profiles() []Profile {
	return []Profile{
		{ID: "shelf-watcher", Name: "shelf watcher",
			Note: "watches a shelf for gaps a few times a minute; store lights, no illuminator; BLE reports",
			Values: map[string]any{
				"node.sleep_uw": 40.0, "node.vision.fps": 1.0, "node.vision.closed_fps": 0.1, "node.vision.frame_uj": 300.0,
				"node.vision.empty_share": 0.5, "node.vision.sensor_mw": 0.4, "node.illuminator.power_mw": 0.0,
				"node.events.per_hour": 4.0, "node.events.occupancy": "store", "node.events.wake_mj": 30.0,
				"node.events.dwell_s": 60.0, "node.radio.class": "ble", "node.radio.payload_bytes": 20,
				"node.heartbeat.per_day": 24.0,
			}},
		{ID: "doorway-counter", Name: "doorway counter",
			Note: "counts people through a door at 10 fps, faster while someone passes; infrared LED after dark; LoRa-class counts",
			Values: map[string]any{
				"node.sleep_uw": 50.0, "node.vision.fps": 10.0, "node.vision.closed_fps": 2.0, "node.vision.busy_fps": 15.0,
				"node.vision.frame_uj": 120.0, "node.vision.empty_share": 0.3, "node.vision.sensor_mw": 0.6,
				"node.illuminator.power_mw": 60.0, "node.illuminator.pulse_ms": 2.0,
				"node.events.per_hour": 30.0, "node.events.occupancy": "corridor", "node.events.holdoff_s": 5.0,
				"node.events.dwell_s": 3.0, "node.events.wake_mj": 5.0, "node.events.awake_s": 0.2,
				"node.radio.class": "lora", "node.radio.lora_sf": 9, "node.radio.payload_bytes": 12,
				"node.heartbeat.per_day": 24.0,
			}},
		{ID: "wake-on-presence", Name: "wake-on-presence module",
			Note: "wakes a larger processor when someone arrives; pauses while the host runs; Wi-Fi reports",
			Values: map[string]any{
				"node.sleep_uw": 30.0, "node.vision.fps": 5.0, "node.vision.closed_fps": 2.0, "node.vision.frame_uj": 200.0,
				"node.vision.empty_share": 0.4, "node.vision.sensor_mw": 0.5, "node.illuminator.power_mw": 40.0,
				"node.events.per_hour": 6.0, "node.events.occupancy": "office", "node.events.holdoff_s": 120.0,
				"node.events.wake_mj": 400.0, "node.events.awake_s": 8.0, "node.events.pause_vision": true,
				"node.radio.class": "wifi", "node.heartbeat.per_day": 4.0,
			}},
		{ID: "parking-bay", Name: "parking-bay watcher",
			Note: "checks a bay every few seconds outdoors; LED at night; LoRa-class report on each change",
			Values: map[string]any{
				"node.sleep_uw": 40.0, "node.vision.fps": 0.5, "node.vision.frame_uj": 400.0, "node.vision.empty_share": 0.6,
				"node.vision.sensor_mw": 0.5, "node.vision.max_exposure_ms": 100.0,
				"node.illuminator.power_mw": 80.0, "node.illuminator.pulse_ms": 5.0,
				"node.events.per_hour": 1.0, "node.events.occupancy": "parking", "node.events.dwell_s": 3600.0,
				"node.events.wake_mj": 10.0, "node.events.awake_s": 0.5,
				"node.radio.class": "lora", "node.radio.lora_sf": 10, "node.radio.payload_bytes": 8,
				"node.heartbeat.per_day": 12.0,
			}},
		{ID: "cold-room", Name: "cold-room monitor",
			Note: "watches a cold store's door and stock once a second; lights only when people work; LTE-M reports",
			Values: map[string]any{
				"node.sleep_uw": 40.0, "node.vision.fps": 1.0, "node.vision.closed_fps": 0.2, "node.vision.frame_uj": 250.0,
				"node.vision.empty_share": 0.5, "node.vision.sensor_mw": 0.4, "node.illuminator.power_mw": 30.0,
				"node.events.per_hour": 2.0, "node.events.occupancy": "store", "node.events.wake_mj": 30.0,
				"node.radio.class": "lpwa", "node.heartbeat.per_day": 24.0,
			}},
	}
}

// ProfileIDs lists the profiles' identifiers.
func ProfileIDs() []string {
	var ids []string
	for _, p := range Profiles() {
		ids = append(ids, p.ID)
	}
	return ids
}

// LookupProfile returns the profile with the given identifier.
func LookupProfile(id string) (Profile, bool) {
	for _, p := range Profiles() {
		if p.ID == id {
			return p, true
		}
	}
	return Profile{}, false
}

// ApplyProfile sets every node field of s from profile id, as choosing the
// profile in the app does; it returns false for an unknown id.
func ApplyProfile(s *Scenario, id string) bool {
	p, ok := LookupProfile(id)
	if !ok {
		return false
	}
	s.Node.Profile = id
	for path, v := range p.Values {
		f, _ := FieldByPath(path)
		f.set(s, v)
	}
	return true
}

// set stores v (of the field's Go type) in s.
func (f Field) set(s *Scenario, v any) {
	switch p := f.ref(s).(type) {
	case *float64:
		*p = v.(float64)
	case **float64:
		x := v.(float64)
		*p = &x
	case *int:
		*p = v.(int)
	case *string:
		*p = v.(string)
	case *bool:
		*p = v.(bool)
	case *[]float64:
		*p = append([]float64(nil), v.([]float64)...)
	default:
		panic("scenario: cannot set " + f.Path)
	}
}
