// Package sketch draws a wall elevation to scale into a grid of character
// cells: the wall outline, every opening outlined and named, and every leaf
// pier labelled with its name and its share of the wall shear.
//
// The grid is shared by the text report (Grid.String, plain ASCII) and the
// editor, which tints cells by the pier they belong to and hit-tests the
// mouse against them; so each cell records what it shows (Cell.Kind), the
// leaf pier it lies in and the opening it belongs to.
//
// Scale: a terminal cell is taken to be twice as tall as it is wide, so one
// row stands for twice the length of one column. The wall is fitted inside
// the box it is given with this aspect kept; the grid is as small as the
// wall needs (Cols ≤ cols, Rows ≤ rows). Outline lines sit on the cell
// whose centre is nearest to the edge they draw, so an opening edge and the
// wall edge it touches share a line.
//
// The package computes no mechanics: shares come from the pier.Result it is
// given, and without a result only the geometry is drawn.
package sketch
