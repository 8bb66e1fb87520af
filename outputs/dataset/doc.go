// Package dataset writes and reads the solved range as a Parquet dataset:
// one flat row per case, streamed in row groups to piece files of a bounded
// size, which take their final names when the shard is complete.
//
// # Units
//
// Every column carries its unit in its name: m for building geometry, m/s for
// wind speeds, kPa for pressures, kN for the hoist load, m³ for concrete, kg
// for mass. A Row's Go fields carry the same units in their names.
//
// # Layout
//
// A dataset is a directory of part files. Each shard's rows are cut into
// pieces of PieceRowGroups row groups of RowGroupRows rows (131,072 rows),
// named
//
//	part-KKKKK-of-NNNNN-piece-PPPPP.parquet
//
// (K = shard, N = shard count, P = piece, from 1; an unsharded run writes
// part-00001-of-00001-piece-00001.parquet and on). The zero-padded names sort
// in case order, and the glob part-*.parquet is the dataset. A Parquet writer
// keeps every row group's metadata until it writes the file's footer, and a
// reader keeps the footer of each file it has open: bounded pieces keep the
// memory of both the same for any grid size (the reader here keeps one piece
// open at a time).
//
// A piece being written lives under a hidden temporary name
// (.part-KKKKK-of-NNNNN-piece-PPPPP.parquet.tmp). When it holds its row
// groups it is finalized and renamed to its partial name,
// _partial-part-KKKKK-of-NNNNN-piece-PPPPP.parquet (PartialPrefix): a valid
// Parquet file, but one that directory scans skipping "_" and "." names
// (pyarrow, Spark) and the part-*.parquet glob pass by. Close finalizes the
// last piece and renames every piece to its final name (the partial name
// without the prefix), so no reader ever sees part of a shard under final
// names (but for a crash between those renames, which Resume completes).
//
// An interrupted run (Writer.Abort) finalizes the piece being written as a
// partial piece too, with the metadata key complete=false. Resume reads the
// shard's pieces back, checks that the grid and catalogue hashes match and
// that the pieces hold one unbroken run of cases, keeps the finished pieces
// as they are, copies the rows of the cut-short piece into a new one and
// carries on, so every final piece equals that of an uninterrupted run row
// for row (and byte for byte). A process killed outright (SIGKILL, power
// loss) leaves its finished partial pieces and the hidden temporary file,
// which has no footer; the next run overwrites it, and Resume starts after
// the last finished piece.
//
// # Metadata
//
// Each piece's key-value metadata holds program_version, grid_sha256,
// catalog_sha256, schema_version, shard ("K/N") and complete ("false" in the
// piece an interrupted run cut short, else "true"). Rows are in enumeration
// order (case_index ascending), which is also the order of the tabulation
// keys, within each piece and across the pieces in name order, and each file
// declares that sorting; every row group carries column statistics (min,
// max) for skipping.
package dataset
