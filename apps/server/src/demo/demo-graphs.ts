/**
 * The Brackwater Joinery's (invented) workbench: its parts and the joints between them, as an edge list.
 * An edge ranking of this graph is a parallel assembly plan: joints with the same label are made at the
 * same step.
 */
export const WORKBENCH_ASSEMBLY = `# Brackwater Joinery: workbench frame, one line per joint (part part)
# parts: 1-4 legs, 5-8 aprons, 9-10 stretchers, 11 shelf, 12-13 top boards, 14 vice, 15 tool tray
1 5
2 5
2 6
3 6
3 7
4 7
4 8
1 8
1 9
2 9
3 10
4 10
9 11
10 11
5 12
6 12
7 13
8 13
12 13
12 14
13 15
`;

/** The Tollgate group's (invented) courtyard: a 6 x 6 grid of paving with a fountain's 2 x 2 hole. */
export const COURTYARD_MASK = ['######', '######', '##..##', '##..##', '######', '######'].join('\n');
