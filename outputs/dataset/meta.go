package dataset

import (
	"fmt"
	"strconv"
	"strings"
)

// Metadata keys of every part file.
const (
	KeyProgramVersion = "program_version"
	KeyGridSHA256     = "grid_sha256"
	KeyCatalogSHA256  = "catalog_sha256"
	KeySchemaVersion  = "schema_version"
	KeyShard          = "shard"    // "K/N"
	KeyComplete       = "complete" // "true" once the part holds every case of its shard
)

// Shard is the slice of the grid one part holds: number K of N, 1-based.
// The zero value means the whole grid (1/1).
type Shard struct {
	K, N int
}

func (s Shard) norm() Shard {
	if s.N == 0 {
		return Shard{1, 1}
	}
	return s
}

// String returns "K/N".
func (s Shard) String() string {
	s = s.norm()
	return fmt.Sprintf("%d/%d", s.K, s.N)
}

func (s Shard) validate() error {
	s = s.norm()
	if s.N < 1 || s.K < 1 || s.K > s.N {
		return fmt.Errorf("dataset: shard %d/%d: want 1 ≤ K ≤ N", s.K, s.N)
	}
	return nil
}

// parseShard reads "K/N".
func parseShard(s string) (Shard, error) {
	k, n, ok := strings.Cut(s, "/")
	ki, err1 := strconv.Atoi(k)
	ni, err2 := strconv.Atoi(n)
	if !ok || err1 != nil || err2 != nil {
		return Shard{}, fmt.Errorf("shard %q: want K/N", s)
	}
	sh := Shard{ki, ni}
	return sh, sh.validate()
}

// Meta is the provenance stored in every part and in every row: the program
// version and the content hashes of the grid file and the catalogue.
type Meta struct {
	ProgramVersion string
	GridSHA256     string
	CatalogSHA256  string
	Shard          Shard
}

// partName is the final file name of a shard's part.
func partName(s Shard) string {
	s = s.norm()
	return fmt.Sprintf("part-%05d-of-%05d.parquet", s.K, s.N)
}

func tempName(s Shard) string    { return "." + partName(s) + ".tmp" }
func partialName(s Shard) string { return partName(s) + ".partial" }

// MismatchError reports a part whose metadata does not match the run that
// wants to resume or read it.
type MismatchError struct {
	File      string
	Key       string
	Got, Want string
}

func (e *MismatchError) Error() string {
	return fmt.Sprintf("dataset: %s: %s is %q, this run has %q; refusing to mix them (start afresh without --resume, or use the same grid and catalogue)", e.File, e.Key, e.Got, e.Want)
}

// VersionError reports a part written with another schema version.
type VersionError struct {
	File      string
	Got, Want string
}

func (e *VersionError) Error() string {
	return fmt.Sprintf("dataset: %s: schema_version %q, this program reads %q; re-run the sweep with this version", e.File, e.Got, e.Want)
}

// checkMeta compares a part's key-value metadata with the wanted Meta.
func checkMeta(file string, lookup func(string) (string, bool), want Meta) error {
	if err := checkVersion(file, lookup); err != nil {
		return err
	}
	for _, kv := range [...][2]string{
		{KeyGridSHA256, want.GridSHA256},
		{KeyCatalogSHA256, want.CatalogSHA256},
		{KeyProgramVersion, want.ProgramVersion},
		{KeyShard, want.Shard.String()},
	} {
		if got, _ := lookup(kv[0]); got != kv[1] {
			return &MismatchError{File: file, Key: kv[0], Got: got, Want: kv[1]}
		}
	}
	return nil
}

func checkVersion(file string, lookup func(string) (string, bool)) error {
	if got, _ := lookup(KeySchemaVersion); got != SchemaVersion {
		return &VersionError{File: file, Got: got, Want: SchemaVersion}
	}
	return nil
}

// metaOf reads the Meta stored in a part.
func metaOf(lookup func(string) (string, bool)) (Meta, error) {
	get := func(k string) string { v, _ := lookup(k); return v }
	sh, err := parseShard(get(KeyShard))
	if err != nil {
		return Meta{}, err
	}
	return Meta{
		ProgramVersion: get(KeyProgramVersion),
		GridSHA256:     get(KeyGridSHA256),
		CatalogSHA256:  get(KeyCatalogSHA256),
		Shard:          sh,
	}, nil
}
