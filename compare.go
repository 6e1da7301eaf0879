package main

import (
	"errors"
	"fmt"
	"io"
	"os"
	"path/filepath"
	"strings"
	"unicode/utf8"

	"nodelife/engine/plan"
	"nodelife/engine/scenario"
)

// cmdCompare prints two to four options side by side (see the README):
// each file is a scenario, read and planned as `nodelife plan --fast` does.
func cmdCompare(args []string, stdout io.Writer) error {
	fs := newFlags("compare")
	asJSON := fs.Bool("json", false, "print the comparison as JSON")
	files, err := fileArgs(fs, args)
	if err != nil {
		return err
	}
	if n := len(files); n < plan.MinOptions || n > plan.MaxOptions {
		return usageError{fmt.Sprintf("compare: give %d to %d scenario files, not %d; `nodelife demo` prints an example",
			plan.MinOptions, plan.MaxOptions, n)}
	}
	opts, err := compareOptions(files)
	if err != nil {
		return err
	}
	c, err := plan.Compare(opts)
	if oe := (*plan.OptionError)(nil); errors.As(err, &oe) {
		return usageError{files[oe.Index] + ": " + oe.Message(func(i int) string { return files[i] })}
	} else if err != nil {
		return usageError{"compare: " + err.Error()}
	}
	if *asJSON {
		return writeJSON(stdout, c)
	}
	_, err = io.WriteString(stdout, compareTable(c, files))
	return err
}

// compareOptions reads, checks and plans each scenario file. Problems in any
// file are all reported, one "FILE: path: problem" a line, before anything
// is planned.
func compareOptions(files []string) ([]plan.Option, error) {
	var problems []string
	scens := make([]scenario.Scenario, len(files))
	inputs := make([]plan.Inputs, len(files))
	for i, name := range files {
		if name == "-" {
			problems = append(problems, `compare: "-": standard input is not read here; give scenario files`)
			continue
		}
		data, err := os.ReadFile(name)
		if err != nil {
			problems = append(problems, err.Error())
			continue
		}
		s, err := scenario.Parse(data)
		if err != nil {
			problems = append(problems, prefixLines(name, err))
			continue
		}
		in, err := readInputs(s, name, false)
		if err != nil {
			problems = append(problems, prefixLines(name, err))
			continue
		}
		scens[i], inputs[i] = s, in
	}
	if len(problems) > 0 {
		return nil, usageError{strings.Join(problems, "\nnodelife: ")}
	}
	names := compareNames(scens, files)
	opts := make([]plan.Option, len(files))
	for i, s := range scens {
		r, err := plan.RunWith(s, inputs[i])
		if err != nil {
			return nil, usageError{prefixLines(files[i], err)}
		}
		opts[i] = plan.Option{Name: names[i], Scenario: s, Result: r}
	}
	return opts, nil
}

// compareNames names each option by its scenario's name, or by its file's
// name when the scenario has none (or the default one); names that would
// repeat get their file's name after them.
func compareNames(scens []scenario.Scenario, files []string) []string {
	untitled := ""
	if f, ok := scenario.FieldByPath("name"); ok {
		untitled, _ = f.Default.(string)
	}
	names := make([]string, len(files))
	for i, s := range scens {
		names[i] = strings.TrimSpace(s.Name)
		if names[i] == "" || names[i] == untitled {
			names[i] = filepath.Base(files[i])
		}
	}
	count := map[string]int{}
	for _, n := range names {
		count[n]++
	}
	for i, n := range names {
		if count[n] > 1 {
			if base := filepath.Base(files[i]); base != n {
				names[i] = n + " (" + base + ")"
			} else {
				names[i] = files[i]
			}
		}
	}
	return names
}

// maxHeadRunes is the widest an option's name is shown at the head of its
// column; longer names are cut with "…" there and given in full below the
// table.
const maxHeadRunes = 24

// compareTable is the readable comparison: one fixed-width column per
// option, values right-aligned, the currency after each cost, then the
// summary sentences and the cautions.
func compareTable(c plan.Comparison, files []string) string {
	money := func(x float64) string { return plan.FormatMoney(x, c.Currency) }
	orNone := func(p *string, none string) string {
		if p == nil {
			return none
		}
		return *p
	}
	type row struct {
		label string
		cells []string
	}
	head := row{label: ""}
	var cut bool
	for _, o := range c.Options {
		name := o.Name
		if utf8.RuneCountInString(name) > maxHeadRunes {
			name, cut = string([]rune(name)[:maxHeadRunes-1])+"…", true
		}
		head.cells = append(head.cells, name)
	}
	rows := []row{head}
	add := func(label string, f func(o plan.OptionCost) string) {
		r := row{label: label}
		for _, o := range c.Options {
			r.cells = append(r.cells, f(o))
		}
		rows = append(rows, r)
	}
	gap := func() { rows = append(rows, row{}) }
	add("Cells", func(o plan.OptionCost) string { return fmt.Sprintf("%d × %s %s", o.CellsPerSet, o.Form, o.Chemistry) })
	add("Harvester", func(o plan.OptionCost) string {
		if o.Harvester == scenario.HarvestNone {
			return "none"
		}
		return fmt.Sprintf("%s %g cm²", o.Harvester, o.HarvesterAreaCm2)
	})
	add("Lasts", func(o plan.OptionCost) string { return o.Lifetime })
	add("Flat on", func(o plan.OptionCost) string { return orNone(o.FirstBrownout, "after the plan") })
	add("Swaps", func(o plan.OptionCost) string { return fmt.Sprint(o.Swaps) })
	add("First swap", func(o plan.OptionCost) string { return orNone(o.FirstSwap, "none") })
	add("Brown-out", func(o plan.OptionCost) string { return fmt.Sprintf("%.1f h", o.BrownoutHours) })
	gap()
	add("Cells cost", func(o plan.OptionCost) string { return money(o.CostCells) })
	add("Harvester cost", func(o plan.OptionCost) string { return money(o.CostHarvester) })
	add("Visits cost", func(o plan.OptionCost) string { return money(o.CostVisits) })
	add("Total cost", func(o plan.OptionCost) string { return money(o.CostTotal) })
	add("Cost a year", func(o plan.OptionCost) string { return money(o.CostPerYear) })

	labelW := 0
	widths := make([]int, len(c.Options))
	for _, r := range rows {
		labelW = max(labelW, utf8.RuneCountInString(r.label))
		for i, cell := range r.cells {
			widths[i] = max(widths[i], utf8.RuneCountInString(cell))
		}
	}
	var b strings.Builder
	fmt.Fprintf(&b, "Options over %d %s, costs in %s\n\n", c.Years, yearsWord(c.Years), c.Currency)
	for i, r := range rows {
		if i > 0 && r.cells == nil {
			b.WriteString("\n")
			continue
		}
		line := fmt.Sprintf("  %-*s", labelW, r.label)
		for j, cell := range r.cells {
			line += fmt.Sprintf("   %*s", widths[j], cell)
		}
		b.WriteString(strings.TrimRight(line, " ") + "\n")
	}
	if cut {
		b.WriteString("\n")
		for i, o := range c.Options {
			fmt.Fprintf(&b, "  %s: %s\n", files[i], o.Name)
		}
	}
	b.WriteString("\n")
	for _, s := range c.Summary {
		b.WriteString(s + "\n")
	}
	b.WriteString("Costs are straight sums over the plan, not discounted; each swap is one site visit, the first installation is not counted as one.\n")
	var cautions bool
	for i, o := range c.Options {
		if len(o.Cautions) == 0 {
			continue
		}
		if !cautions {
			b.WriteString("Cautions (`nodelife plan FILE` explains each)\n")
			cautions = true
		}
		var codes []string
		for _, k := range o.Cautions {
			codes = append(codes, k.Code)
		}
		fmt.Fprintf(&b, "  - %s: %s\n", files[i], strings.Join(codes, ", "))
	}
	b.WriteString("A planning aid: confirm with the cell maker's datasheet and a field measurement.\n")
	return b.String()
}

func yearsWord(n int) string {
	if n == 1 {
		return "year"
	}
	return "years"
}
