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
	KeyComplete       = "complete" // "false" only in the piece an interrupted run cut short
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

// PieceRowGroups is the number of row groups in each piece file of a shard
// (131,072 rows at RowGroupRows 4096). A Parquet writer holds the metadata
// of every row group of its file until the footer is written, and a reader
// holds the footer of every file it has open; cutting a shard into pieces
// of a bounded number of groups keeps both bounded however large the grid.
const PieceRowGroups = 32

// PartialPrefix begins the name of every piece of a shard that has not
// finished: the pieces of a run in progress and those an interrupted run
// keeps. Directory scans that skip names beginning with "_" or "." (pyarrow,
// Spark) and the part-*.parquet glob pass them by; dropping the prefix gives
// the piece's final name.
const PartialPrefix = "_partial-"

// PieceName is the final file name of piece p (1-based) of shard s:
// part-KKKKK-of-NNNNN-piece-PPPPP.parquet. The zero padding makes the
// names sort in case order.
func PieceName(s Shard, p int) string {
	s = s.norm()
	return fmt.Sprintf("part-%05d-of-%05d-piece-%05d.parquet", s.K, s.N, p)
}

// PartialName is the name of piece p of shard s while the shard has not
// finished: PartialPrefix + PieceName(s, p).
func PartialName(s Shard, p int) string { return PartialPrefix + PieceName(s, p) }

// tempName is the hidden name of the piece being written.
func tempName(s Shard, p int) string { return "." + PieceName(s, p) + ".tmp" }

// FileName is a dataset file name taken apart.
type FileName struct {
	Shard   Shard
	Piece   int  // 1-based
	Partial bool // named with PartialPrefix: its shard has not finished
}

// ParseFileName takes apart a name made by PieceName or PartialName; ok is
// false for any other name.
func ParseFileName(name string) (f FileName, ok bool) {
	rest, partial := strings.CutPrefix(name, PartialPrefix)
	var k, n, p int
	if _, err := fmt.Sscanf(rest, "part-%05d-of-%05d-piece-%05d.parquet", &k, &n, &p); err != nil {
		return FileName{}, false
	}
	f = FileName{Shard: Shard{k, n}, Piece: p, Partial: partial}
	if f.Shard.validate() != nil || p < 1 || PieceName(f.Shard, p) != rest {
		return FileName{}, false
	}
	return f, true
}

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
