package main

import (
	"bufio"
	"io"
	"os"
	"path/filepath"
	"strconv"
	"strings"
	"testing"

	"github.com/spansweep/spansweep/grids"
)

const examplesDir = "../../testdata/examples"

// exampleFile is a scheduler file read as lines, "key: value" fields and
// the spansweep command lines it holds.
type exampleFile struct {
	fields   map[string][]string // YAML "key: value" or "#SBATCH --key=value", in file order
	commands [][]string          // words after "spansweep sweep", one slice per command line
	comments [][]string          // the same, from comment lines (documented follow-up steps)
	vars     map[string]string   // shell assignments NAME=value
}

// readExample scans a scheduler file line by line: a YAML key scan and a
// shell-word split, enough for these files (no YAML module is needed).
func readExample(t *testing.T, name string) exampleFile {
	t.Helper()
	f, err := os.Open(filepath.Join(examplesDir, name))
	if err != nil {
		t.Fatal(err)
	}
	defer f.Close()
	ex := exampleFile{fields: map[string][]string{}, vars: map[string]string{}}
	sc := bufio.NewScanner(f)
	for sc.Scan() {
		line := strings.TrimSpace(sc.Text())
		if rest, ok := strings.CutPrefix(line, "#SBATCH --"); ok {
			k, v, _ := strings.Cut(rest, "=")
			ex.fields[k] = append(ex.fields[k], v)
			continue
		}
		_, cmd, isCmd := strings.Cut(line, "spansweep sweep ")
		words := strings.Fields(strings.ReplaceAll(cmd, `"`, ""))
		switch {
		case strings.HasPrefix(line, "#") && isCmd:
			ex.comments = append(ex.comments, words)
			continue
		case strings.HasPrefix(line, "#"):
			continue
		case isCmd:
			ex.commands = append(ex.commands, words)
			continue
		}
		if k, v, ok := strings.Cut(line, ": "); ok && !strings.ContainsAny(k, " {[") {
			ex.fields[strings.TrimPrefix(k, "- ")] = append(ex.fields[strings.TrimPrefix(k, "- ")], v)
			continue
		}
		if k, v, ok := strings.Cut(line, "="); ok && k != "" && !strings.ContainsAny(k, " $-") {
			ex.vars[k] = v
		}
	}
	if err := sc.Err(); err != nil {
		t.Fatal(err)
	}
	return ex
}

// field returns the only value of a key, failing the test if there is not
// exactly one.
func (ex exampleFile) field(t *testing.T, key string) string {
	t.Helper()
	if v := ex.fields[key]; len(v) == 1 {
		return v[0]
	}
	t.Fatalf("got values %q for %s, want one", ex.fields[key], key)
	return ""
}

// expand replaces each name by its value in every word of a command.
func expand(words []string, values map[string]string) []string {
	out := make([]string, len(words))
	for i, w := range words {
		for name, v := range values {
			w = strings.ReplaceAll(w, name, v)
		}
		out[i] = w
	}
	return out
}

// parseSweepArgs checks that a command's words are flags the sweep command
// takes and returns them.
func parseSweepArgs(t *testing.T, words []string) sweepFlags {
	t.Helper()
	var f sweepFlags
	if err := parseFlags(newSweepFlagSet(&f, io.Discard), words); err != nil {
		t.Fatalf("%q: %v", words, err)
	}
	return f
}

// checkShards checks that the tasks' shards are exactly 1/n … n/n, so the
// parts cover the grid once (grids.Shard.Range partitions it).
func checkShards(t *testing.T, shards []string, n int) {
	t.Helper()
	if len(shards) != n {
		t.Fatalf("got %d tasks, want %d", len(shards), n)
	}
	for i, s := range shards {
		sh, err := grids.ParseShard(s)
		if err != nil {
			t.Fatalf("task %d: %v", i, err)
		}
		if sh != (grids.Shard{K: i + 1, N: n}) {
			t.Errorf("task %d runs shard %s, want %d/%d", i, sh, i+1, n)
		}
	}
}

// runExampleFlow runs the tasks' commands, with --grid, --catalog and --out
// moved to a small grid, a small catalogue and a temporary directory, then the final --tables-only pass:
// the example's commands, as written, make a complete dataset and tables.
func runExampleFlow(t *testing.T, tasks [][]string, final []string) {
	t.Helper()
	f := newSweepFixture(t)
	redirect := func(words []string) []string {
		out := append(append([]string(nil), words...), "--catalog", f.cat)
		for i := 0; i+1 < len(out); i++ {
			switch out[i] {
			case "--grid":
				out[i+1] = f.grid
			case "--out":
				out[i+1] = filepath.Join(f.dir, "out")
			}
		}
		return out
	}
	for _, words := range tasks {
		var so, se strings.Builder
		if code := run(append([]string{"sweep"}, redirect(words)...), &so, &se); code != exitOK {
			t.Fatalf("%q: exit %d:\n%s", words, code, se.String())
		}
	}
	var so, se strings.Builder
	if code := run(append([]string{"sweep"}, redirect(final)...), &so, &se); code != exitOK {
		t.Fatalf("%q: exit %d:\n%s", final, code, se.String())
	}
	if n := len(f.rows("out")); n != sweepGridCases {
		t.Errorf("the example's shards wrote %d rows, want %d", n, sweepGridCases)
	}
	if _, err := os.Stat(filepath.Join(f.dir, "out", "tables", tablesMarkdown)); err != nil {
		t.Errorf("the example's final pass wrote no tables: %v", err)
	}
}

// The Kubernetes Indexed Job gives pods JOB_COMPLETION_INDEX = 0 … completions−1
// (Kubernetes documentation, "Indexed Job"); each must run shard index+1 of
// completions, and the tables job must read the same --out.
func TestKubernetesExample(t *testing.T) {
	job := readExample(t, "k8s-indexed-job.yaml")
	if got := job.field(t, "completionMode"); got != "Indexed" {
		t.Fatalf("completionMode %q, want Indexed", got)
	}
	n, err := strconv.Atoi(job.field(t, "completions"))
	if err != nil {
		t.Fatal(err)
	}
	if p, err := strconv.Atoi(job.field(t, "parallelism")); err != nil || p < 1 || p > n {
		t.Errorf("parallelism %v (%v), want 1 to %d", p, err, n)
	}
	if len(job.commands) != 1 {
		t.Fatalf("got %d spansweep commands, want 1", len(job.commands))
	}
	var tasks [][]string
	var shards []string
	for i := range n {
		words := expand(job.commands[0], map[string]string{"$((JOB_COMPLETION_INDEX+1))": strconv.Itoa(i + 1)})
		f := parseSweepArgs(t, words)
		if !f.resume {
			t.Errorf("pod %d: no --resume, so a retried pod would refuse its earlier part", i)
		}
		tasks, shards = append(tasks, words), append(shards, f.shard)
	}
	checkShards(t, shards, n)

	tables := readExample(t, "k8s-tables-job.yaml")
	if len(tables.commands) != 1 {
		t.Fatalf("tables job: got %d spansweep commands, want 1", len(tables.commands))
	}
	final := parseSweepArgs(t, tables.commands[0])
	first := parseSweepArgs(t, tasks[0])
	if !final.tablesOnly || final.out != first.out || final.grid != first.grid {
		t.Errorf("tables job: got --tables-only %v, --out %s, --grid %s; want true, %s, %s",
			final.tablesOnly, final.out, final.grid, first.out, first.grid)
	}
	runExampleFlow(t, tasks, tables.commands[0])
}

// A Slurm job array --array=1-N gives tasks SLURM_ARRAY_TASK_ID = 1 … N
// (Slurm sbatch documentation); each must run shard ID/N.
func TestSlurmExample(t *testing.T) {
	job := readExample(t, "slurm-array.sh")
	lo, hi, ok := strings.Cut(job.field(t, "array"), "-")
	first, err1 := strconv.Atoi(lo)
	n, err2 := strconv.Atoi(hi)
	if !ok || err1 != nil || err2 != nil || first != 1 {
		t.Fatalf("--array=%s, want 1-N", job.field(t, "array"))
	}
	cpus := job.field(t, "cpus-per-task")
	if len(job.commands) != 1 {
		t.Fatalf("got %d spansweep commands, want 1", len(job.commands))
	}
	out, ok := job.vars["OUT"]
	if !ok {
		t.Fatalf("no OUT= assignment")
	}
	var tasks [][]string
	var shards []string
	for id := 1; id <= n; id++ {
		words := expand(job.commands[0], map[string]string{
			"${SLURM_ARRAY_TASK_ID}": strconv.Itoa(id), "${SLURM_CPUS_PER_TASK}": cpus, "$OUT": out,
		})
		f := parseSweepArgs(t, words)
		if strconv.Itoa(f.workers) != cpus || !f.resume || f.out != out {
			t.Errorf("task %d: got --workers %d, --resume %v, --out %s; want %s, true, %s", id, f.workers, f.resume, f.out, cpus, out)
		}
		tasks, shards = append(tasks, words), append(shards, f.shard)
	}
	checkShards(t, shards, n)
	if len(job.comments) != 1 {
		t.Fatalf("got %d documented follow-up commands, want the --tables-only one", len(job.comments))
	}
	final := parseSweepArgs(t, job.comments[0])
	if !final.tablesOnly || final.out != out {
		t.Errorf("follow-up: got --tables-only %v, --out %s; want true, %s", final.tablesOnly, final.out, out)
	}
	runExampleFlow(t, tasks, job.comments[0])
}
