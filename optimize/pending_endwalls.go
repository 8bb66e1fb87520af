package optimize

// endWalls is being written; this placeholder goes when it lands.
func (d *designer) endWalls() bool { return true }
