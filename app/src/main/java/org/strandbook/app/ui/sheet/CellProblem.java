package org.strandbook.app.ui.sheet;

/** Why a cell's new value was refused, addressed as a sheet addresses it. */
public record CellProblem(CellAddress address, String header, String reason) {

    /** "D3 Length (m): must be more than 0 m, was -5". */
    public String describe() {
        return address.name() + " " + header + ": " + reason;
    }
}
