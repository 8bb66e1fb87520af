package main

import (
	"errors"
	"fmt"
	"io/fs"

	"github.com/spansweep/spansweep/grids"
	"github.com/spansweep/spansweep/optimize"
	"github.com/spansweep/spansweep/outputs/dataset"
)

// Tables and plots are always built from the dataset as written, never
// from results held in memory: a resumed run has the earlier run's cases
// only as rows, and a sharded range only as parts. One path for every run
// is what makes the tables byte-identical whatever the workers, sharding or
// interruptions.

// resultOf rebuilds the result a dataset row was written from, with its
// case taken from the grid (the row's id must match), as far as the tables
// and plots read it: FromResult(resultOf(row)) gives the row back.
func resultOf(g *grids.Grid, r *dataset.Row) (optimize.Result, error) {
	if r.CaseIndex < 0 || r.CaseIndex >= g.Count() {
		return optimize.Result{}, fmt.Errorf("row %s: case_index %d: the grid has cases 0 to %d", r.CaseID, r.CaseIndex, g.Count()-1)
	}
	c := g.Case(r.CaseIndex)
	if c.ID != r.CaseID {
		return optimize.Result{}, fmt.Errorf("row %d: case_id %s, but the grid's case %d is %s", r.CaseIndex, r.CaseID, r.CaseIndex, c.ID)
	}
	res := optimize.Result{
		Case: c, Reason: r.Reason,
		VUltimateMS: r.VULSMS, VServiceMS: r.VSLSMS, QUltimateKPa: r.QULSKPa, QServiceKPa: r.QSLSKPa,
		Frames: r.Frames, KneeBraceColumnM: r.KneeBraceColumnM, KneeBraceRafterM: r.KneeBraceRafterM,
		FlyBracesPerFrame: r.FlyBracesPerFrame,
		Footing: footingOf(r.FootingWidthM, r.FootingDepthM, r.FootingCount, r.ConcreteM3,
			r.BoltSize, r.BoltsPerBase, r.FootingCheck, r.FootingClause, r.FootingUtilisation),
		BracedFooting: footingOf(r.BracedFootingWidthM, r.BracedFootingDepthM, r.BracedFootingCount, r.BracedConcreteM3,
			r.BracedBoltSize, r.BracedBoltsPerBase, r.BracedFootingCheck, r.BracedFootingClause, r.BracedFootingUtilisation),
		SteelMassKg: r.SteelMassKg, MassPerFloorKgM2: r.MassPerFloorKgM2, Cost: r.Cost, Analyses: r.Analyses,
	}
	switch r.Status {
	case optimize.OK.String():
		res.Status = optimize.OK
	case optimize.NoSolution.String():
		res.Status = optimize.NoSolution
	default:
		return optimize.Result{}, fmt.Errorf("row %s: status %q: want %q or %q", r.CaseID, r.Status, optimize.OK, optimize.NoSolution)
	}
	res.Members = make([]optimize.MemberGroup, len(optimize.Roles))
	for i, role := range optimize.Roles {
		m := r.Member(role)
		res.Members[i] = optimize.MemberGroup{
			Role: role, Designation: m.Designation, SpacingM: m.SpacingM, SpanType: m.SpanType,
			Bridging: m.BridgingRows, Lines: m.Lines, Count: m.Count, LengthEachM: m.LengthEachM, MassKg: m.MassKg,
			DeflectionRatio: m.DeflectionRatio,
			Governing: optimize.Governing{Check: m.Check, Standard: m.Standard, Clause: m.Clause,
				LimitState: m.LimitState, Combination: m.Combination, Utilisation: m.Utilisation},
		}
	}
	return res, nil
}

// footingOf is a pad as the dataset holds it (the governing check's name,
// clause and utilisation only).
func footingOf(widthM, depthM float64, count int, concreteM3 float64, bolt string, bolts int,
	check, clause string, utilisation float64) optimize.Footing {
	return optimize.Footing{
		WidthM: widthM, DepthM: depthM, Count: count, ConcreteM3: concreteM3, BoltSize: bolt, BoltsPerBase: bolts,
		Governing: optimize.Governing{Check: check, Clause: clause, Utilisation: utilisation},
	}
}

// openDataset opens the dataset directory and checks that it was written
// from this run's grid and catalogue by this version. A missing, empty or
// foreign dataset is a usage error.
func (s *sweepRun) openDataset() (*dataset.Dataset, error) {
	d, err := dataset.Open(s.layout.datasetDir())
	var mm *dataset.MismatchError
	var ve *dataset.VersionError
	switch {
	case errors.Is(err, fs.ErrNotExist), errors.Is(err, dataset.ErrNoParts):
		return nil, usagef("%v: run the sweep (every shard) into --out %s first", err, s.layout.root)
	case errors.As(err, &mm), errors.As(err, &ve):
		return nil, usagef("%v", err)
	case err != nil:
		return nil, err
	}
	if err := s.checkProvenance(d); err != nil {
		d.Close()
		return nil, err
	}
	return d, nil
}

// checkProvenance checks that a dataset was made from this run's grid and
// catalogue by this version.
func (s *sweepRun) checkProvenance(d *dataset.Dataset) error {
	want, got := s.meta(), d.Meta()
	for _, kv := range [...][3]string{
		{dataset.KeyGridSHA256, got.GridSHA256, want.GridSHA256},
		{dataset.KeyCatalogSHA256, got.CatalogSHA256, want.CatalogSHA256},
		{dataset.KeyProgramVersion, got.ProgramVersion, want.ProgramVersion},
	} {
		if kv[1] != kv[2] {
			return usagef("%s: %s is %q, this run has %q; nothing was overwritten. Give the --grid and --catalog the dataset was made with, or another --out",
				s.layout.datasetDir(), kv[0], kv[1], kv[2])
		}
	}
	return nil
}

// checkSiblings refuses to add a part to a dataset directory whose finished
// parts come from another grid, catalogue or version.
func (s *sweepRun) checkSiblings() error {
	d, err := dataset.Open(s.layout.datasetDir())
	var mm *dataset.MismatchError
	var ve *dataset.VersionError
	switch {
	case errors.Is(err, fs.ErrNotExist), errors.Is(err, dataset.ErrNoParts):
		return nil
	case errors.As(err, &mm), errors.As(err, &ve):
		return usagef("%v", err)
	case err != nil:
		return err
	}
	defer d.Close()
	return s.checkProvenance(d)
}

// eachResult calls fn, in order, with every row of cases [lo, hi) and the
// result rebuilt from it. The rows must be exactly those cases: a gap (a
// shard not yet finished) is a usage error naming the missing cases.
func (s *sweepRun) eachResult(d *dataset.Dataset, lo, hi int, fn func(*optimize.Result) error) error {
	next := lo
	_, err := d.Scan(dataset.Filter{dataset.Between("case_index", float64(lo), float64(hi-1))}, func(r *dataset.Row) error {
		if r.CaseIndex != next {
			return s.gapError(d, next, r.CaseIndex)
		}
		res, err := resultOf(s.grid, r)
		if err != nil {
			return fmt.Errorf("%s: %w", s.layout.datasetDir(), err)
		}
		next++
		return fn(&res)
	})
	if err != nil {
		return err
	}
	if next != hi {
		return s.gapError(d, next, hi)
	}
	return nil
}

// gapError names cases [from, to) missing from the dataset and the shards
// that hold them.
func (s *sweepRun) gapError(d *dataset.Dataset, from, to int) error {
	if to < from {
		return fmt.Errorf("%s: case %d appears twice or out of order", s.layout.datasetDir(), to)
	}
	n := d.Meta().Shard.N
	var shards []string
	for k := 1; k <= n; k++ {
		lo, hi := grids.Shard{K: k, N: n}.Range(s.grid.Count())
		if lo < to && hi > from {
			shards = append(shards, fmt.Sprintf("%d/%d", k, n))
		}
	}
	return usagef("%s lacks cases %d to %d of the grid's %d: shard(s) %v have not finished; run them (with --resume if interrupted) first",
		s.layout.datasetDir(), from, to-1, s.grid.Count(), shards)
}
