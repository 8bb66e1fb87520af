package optimize

// girts is being written; this placeholder goes when it lands.
func (d *designer) girts() bool { return true }
