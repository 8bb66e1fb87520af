package catalog

import (
	"bytes"
	"crypto/sha256"
	"encoding/csv"
	"encoding/hex"
	"errors"
	"fmt"
	"io"
	"math"
	"os"
	"strconv"
	"strings"
)

// Columns are the catalogue CSV's columns, in order. flange2_mm may be empty
// except for a Z; a strap's width and a rod's diameter go in depth_mm.
var Columns = []string{
	"designation", "shape", "depth_mm", "flange_mm", "flange2_mm", "lip_mm",
	"thickness_mm", "inner_radius_mm", "fy_mpa", "fu_mpa",
}

// Load reads a catalogue CSV (lines starting with # are comments) named
// name in messages. Every bad row is reported in one *ValidationError and
// nothing is returned with it.
func Load(r io.Reader, name string) (*Catalogue, error) {
	data, err := io.ReadAll(r)
	if err != nil {
		return nil, fmt.Errorf("catalog %s: %w", name, err)
	}
	return parse(data, name)
}

// LoadFile reads a catalogue CSV file.
func LoadFile(path string) (*Catalogue, error) {
	data, err := os.ReadFile(path)
	if err != nil {
		return nil, fmt.Errorf("catalog: %w", err)
	}
	return parse(data, path)
}

func parse(data []byte, name string) (*Catalogue, error) {
	sum := sha256.Sum256(data)
	cat := &Catalogue{Name: name, HashSHA256: hex.EncodeToString(sum[:])}
	verr := &ValidationError{File: name}
	rd := csv.NewReader(bytes.NewReader(data))
	rd.Comment = '#'
	rd.FieldsPerRecord = -1
	rd.TrimLeadingSpace = true
	seen := map[string]int{}
	header := true
	for {
		rec, err := rd.Read()
		if errors.Is(err, io.EOF) {
			break
		}
		if err != nil {
			var pe *csv.ParseError
			if !errors.As(err, &pe) {
				return nil, fmt.Errorf("catalog %s: %w", name, err)
			}
			verr.Problems = append(verr.Problems, Problem{Line: pe.Line, Reason: "unreadable CSV: " + pe.Err.Error()})
			continue
		}
		line, _ := rd.FieldPos(0)
		if header {
			header = false
			if p, ok := headerProblem(rec); !ok {
				p.Line = line
				verr.Problems = append(verr.Problems, p)
				return nil, verr // the columns cannot be trusted: stop here
			}
			continue
		}
		sec, ps := parseRow(rec)
		key := strings.ToUpper(sec.Designation)
		if prev, dup := seen[key]; dup && key != "" {
			ps = append(ps, Problem{Column: "designation", Value: sec.Designation,
				Reason: fmt.Sprintf("duplicate designation (first on line %d); each must be unique", prev)})
		} else {
			seen[key] = line
		}
		for i := range ps {
			ps[i].Line = line
		}
		verr.Problems = append(verr.Problems, ps...)
		if len(ps) == 0 {
			cat.Sections = append(cat.Sections, sec)
		}
	}
	if len(verr.Problems) > 0 {
		return nil, verr
	}
	if len(cat.Sections) == 0 {
		return nil, fmt.Errorf("catalog %s: %w", name, ErrEmpty)
	}
	return cat, nil
}

func headerProblem(rec []string) (Problem, bool) {
	got := strings.Join(rec, ",")
	want := strings.Join(Columns, ",")
	if strings.TrimPrefix(got, "\ufeff") == want {
		return Problem{}, true
	}
	return Problem{Column: "header", Value: got, Reason: "columns must be exactly: " + want}, false
}

// parseRow reads one data row into a section, or lists its problems.
func parseRow(rec []string) (Section, []Problem) {
	if len(rec) != len(Columns) {
		return Section{Designation: field(rec, 0)}, []Problem{{Column: "row", Value: strings.Join(rec, ","),
			Reason: fmt.Sprintf("has %d columns; want %d: %s", len(rec), len(Columns), strings.Join(Columns, ","))}}
	}
	var ps []Problem
	des := strings.TrimSpace(rec[0])
	shape, err := ParseShape(strings.TrimSpace(rec[1]))
	if err != nil {
		ps = append(ps, Problem{Column: "shape", Value: rec[1], Reason: "unknown shape; allowed " + ShapeList()})
	}
	nums := make([]float64, len(Columns))
	for i := 2; i < len(Columns); i++ {
		v, p, ok := parseNumber(Columns[i], rec[i], optional(shape, Columns[i]))
		if !ok {
			ps = append(ps, p)
		}
		nums[i] = v
	}
	if shape != ShapeZ && nums[4] != 0 && nums[4] != nums[3] {
		ps = append(ps, Problem{Column: "flange2_mm", Value: rec[4],
			Reason: fmt.Sprintf("only a Z has a second flange; leave it empty or equal to flange_mm for a %s", shape)})
	}
	if len(ps) > 0 {
		return Section{Designation: des}, ps
	}
	g := Geometry{DepthMM: nums[2], FlangeMM: nums[3], Flange2MM: nums[4], LipMM: nums[5], ThicknessMM: nums[6], InnerRadiusMM: nums[7]}
	sec, err := NewSection(des, shape, g, nums[8], nums[9])
	var verr *ValidationError
	if errors.As(err, &verr) {
		return Section{Designation: des}, verr.Problems
	}
	return sec, nil
}

// optional reports whether a column may be left empty (read as 0) for a shape.
func optional(shape Shape, column string) bool {
	switch column {
	case "depth_mm", "fy_mpa", "fu_mpa":
		return false
	case "flange2_mm":
		return shape != ShapeZ
	case "thickness_mm":
		return shape == ShapeRod
	case "lip_mm":
		return true
	}
	return !shape.thinWalled()
}

// parseNumber reads a finite number; empty is 0 where the column is optional.
func parseNumber(column, s string, canBeEmpty bool) (float64, Problem, bool) {
	s = strings.TrimSpace(s)
	if s == "" {
		if canBeEmpty {
			return 0, Problem{}, true
		}
		return 0, Problem{Column: column, Reason: "empty; a number is required"}, false
	}
	v, err := strconv.ParseFloat(s, 64)
	if err != nil || math.IsNaN(v) || math.IsInf(v, 0) {
		return 0, Problem{Column: column, Value: s, Reason: "not a finite number"}, false
	}
	return v, Problem{}, true
}

func field(rec []string, i int) string {
	if i < len(rec) {
		return strings.TrimSpace(rec[i])
	}
	return ""
}
