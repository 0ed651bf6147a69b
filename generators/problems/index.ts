import type { ProblemDefinition } from '../../src/atlas/definition.ts';
import circlesTangentToThreeCircles from './circles/circles-tangent-to-three-circles.ts';
import pointsCommonToTwoConics from './intersections/points-common-to-two-conics.ts';
import pointsCommonToTwoCubics from './intersections/points-common-to-two-cubics.ts';
import conicsThrough5Points from './conics/conics-through-5-points.ts';
import conicsThrough4Points from './conics/conics-through-4-points-tangent-to-1-line.ts';
import conicsThrough3Points from './conics/conics-through-3-points-tangent-to-2-lines.ts';
import conicsThrough2Points from './conics/conics-through-2-points-tangent-to-3-lines.ts';
import conicsThrough1Point from './conics/conics-through-1-point-tangent-to-4-lines.ts';
import conicsTangentTo5Lines from './conics/conics-tangent-to-5-lines.ts';
import conicsThrough4PointsTangentTo1Conic from './conics/conics-through-4-points-tangent-to-1-conic.ts';
import conicsThrough3PointsTangentTo2Conics from './conics/conics-through-3-points-tangent-to-2-conics.ts';
import conicsThrough2PointsTangentTo3Conics from './conics/conics-through-2-points-tangent-to-3-conics.ts';
import conicsThrough1PointTangentTo4Conics from './conics/conics-through-1-point-tangent-to-4-conics.ts';
import conicsTangentTo5Conics from './conics/conics-tangent-to-5-conics.ts';
import linesOnACubicSurface from './surfaces/lines-on-a-cubic-surface.ts';
import linesMeetingFourLines from './schubert/lines-meeting-four-lines.ts';
import linesMeetingSixPlanesIn4Space from './schubert/lines-meeting-six-planes-in-4-space.ts';
import linesMeetingEight3PlanesIn5Space from './schubert/lines-meeting-eight-3-planes-in-5-space.ts';
import planesMeetingNinePlanesIn5Space from './schubert/planes-meeting-nine-planes-in-5-space.ts';
import flexesOfAPlaneCubic from './plane-curves/flexes-of-a-plane-cubic.ts';
import bitangentsOfAPlaneQuartic from './plane-curves/bitangents-of-a-plane-quartic.ts';
import flexesOfAPlaneQuartic from './plane-curves/flexes-of-a-plane-quartic.ts';
import flexesOfAPlaneQuintic from './plane-curves/flexes-of-a-plane-quintic.ts';
import singularCubics from './plane-curves/singular-members-of-a-pencil-of-cubics.ts';
import singularQuartics from './plane-curves/singular-members-of-a-pencil-of-quartics.ts';
import singularQuintics from './plane-curves/singular-members-of-a-pencil-of-quintics.ts';
import tangentLinesFromAPointToAQuartic from './plane-curves/tangent-lines-from-a-point-to-a-quartic.ts';
import commonTangentLinesOfTwoConics from './plane-curves/common-tangent-lines-of-two-conics.ts';
import commonTangentLinesOfTwoCubics from './plane-curves/common-tangent-lines-of-two-cubics.ts';
import pointsCommonToThreeQuadricSurfaces from './intersections/points-common-to-three-quadric-surfaces.ts';
import pointsCommonToThreeCubicSurfaces from './intersections/points-common-to-three-cubic-surfaces.ts';
import euclideanDistanceDegreeOfAnEllipse from './distance-and-optimisation/euclidean-distance-degree-of-an-ellipse.ts';
import euclideanDistanceDegreeOfAPlaneCubic from './distance-and-optimisation/euclidean-distance-degree-of-a-plane-cubic.ts';
import euclideanDistanceDegreeOfAPlaneQuartic from './distance-and-optimisation/euclidean-distance-degree-of-a-plane-quartic.ts';
import euclideanDistanceDegreeOfAQuadricSurface from './distance-and-optimisation/euclidean-distance-degree-of-a-quadric-surface.ts';
import eigenvectorsOfASymmetricTernaryCubic from './distance-and-optimisation/eigenvectors-of-a-symmetric-ternary-cubic.ts';
import eigenvectorsOfASymmetricTernaryQuartic from './distance-and-optimisation/eigenvectors-of-a-symmetric-ternary-quartic.ts';
import rationalCubicsThrough8Points from './rational-curves/rational-cubics-through-8-points.ts';
import forwardKinematicsOfAPlanar3RprRobot from './mechanisms/forward-kinematics-of-a-planar-3-rpr-robot.ts';
import perspectiveThreePointPose from './mechanisms/perspective-three-point-pose.ts';
import forwardKinematicsOfAStewartGoughPlatform from './mechanisms/forward-kinematics-of-a-stewart-gough-platform.ts';
import relativePoseFromFivePointPairs from './mechanisms/relative-pose-from-five-point-pairs.ts';

/** Every problem of the atlas, in the order the home page lists them. Slugs are permanent. */
export const problems: readonly ProblemDefinition[] = [
  circlesTangentToThreeCircles,
  pointsCommonToTwoConics,
  pointsCommonToTwoCubics,
  conicsThrough5Points,
  conicsThrough4Points,
  conicsThrough3Points,
  conicsThrough2Points,
  conicsThrough1Point,
  conicsTangentTo5Lines,
  conicsThrough4PointsTangentTo1Conic,
  conicsThrough3PointsTangentTo2Conics,
  conicsThrough2PointsTangentTo3Conics,
  conicsThrough1PointTangentTo4Conics,
  conicsTangentTo5Conics,
  linesOnACubicSurface,
  linesMeetingFourLines,
  linesMeetingSixPlanesIn4Space,
  linesMeetingEight3PlanesIn5Space,
  planesMeetingNinePlanesIn5Space,
  flexesOfAPlaneCubic,
  bitangentsOfAPlaneQuartic,
  flexesOfAPlaneQuartic,
  flexesOfAPlaneQuintic,
  singularCubics,
  singularQuartics,
  singularQuintics,
  tangentLinesFromAPointToAQuartic,
  commonTangentLinesOfTwoConics,
  commonTangentLinesOfTwoCubics,
  pointsCommonToThreeQuadricSurfaces,
  pointsCommonToThreeCubicSurfaces,
  euclideanDistanceDegreeOfAnEllipse,
  euclideanDistanceDegreeOfAPlaneCubic,
  euclideanDistanceDegreeOfAPlaneQuartic,
  euclideanDistanceDegreeOfAQuadricSurface,
  eigenvectorsOfASymmetricTernaryCubic,
  eigenvectorsOfASymmetricTernaryQuartic,
  rationalCubicsThrough8Points,
  forwardKinematicsOfAPlanar3RprRobot,
  perspectiveThreePointPose,
  forwardKinematicsOfAStewartGoughPlatform,
  relativePoseFromFivePointPairs,
];
