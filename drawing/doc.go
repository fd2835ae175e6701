// Package drawing draws a wall elevation and a storey plan as SVG sheets for
// the calculation package (docs/method.md §10).
//
// It is pure: it takes values (a wall, its leaf piers and their values from
// the caller's basis, optionally a stress field; a storey analysis) and
// returns SVG bytes. It reads and writes no files and computes no
// mechanics.
//
// # The sheet
//
// One landscape sheet, ANSI B (17 × 11 in) for US walls and ISO A3 for SI
// walls, with the SVG's width and height in millimetres, so a print at 100 %
// is to scale. The scale is the largest standard one at which the wall (or
// the plan) fits: an architect's scale (1/4" = 1'-0" …) for US walls, a
// preferred metric ratio (1:50 …) for SI walls; a graphic scale bar stays
// true at any print size. Dimensions are in feet-inches (geometry's
// formatting) or whole millimetres.
//
// # Invariants
//
//   - Every string from a file (titles, names, paths) goes through
//     encoding/xml, so the output is well-formed XML whatever it holds;
//     characters XML cannot carry become U+FFFD.
//   - Coordinates are rounded to 0.01 mm.
//   - Pier classes are told apart by fill and by hatch, so a black-and-white
//     print reads the same as colour.
//   - Every sheet carries the caution: results support, and do not replace,
//     the judgement of a licensed engineer; local codes govern.
package drawing
