import { describe, expect, it } from 'vitest';
import { cubeEdges, pointWithDrop, project } from '../../../../generators/problems/shared/axonometric.ts';

describe('the orthographic view of 3-space', () => {
  it('is linear and keeps the origin fixed', () => {
    expect(project(0, 0, 0)).toEqual([0, 0]);
    const [a, b] = [project(1, 2, 3), project(2, 4, 6)];
    expect(b[0]).toBeCloseTo(2 * a[0], 14);
    expect(b[1]).toBeCloseTo(2 * a[1], 14);
  });

  it('shows height z upright, shortened by the tilt (cos 0.45)', () => {
    expect(project(0, 0, 1)).toEqual([0, Math.cos(0.45)]);
  });

  it('preserves length along the turned x-axis (an orthographic view, no perspective)', () => {
    const [u, v] = project(Math.cos(0.5), -Math.sin(0.5), 0);
    expect(u).toBeCloseTo(1, 14);
    expect(v).toBeCloseTo(0, 14);
  });

  it('draws twelve cube edges and a point with its drop line to the floor', () => {
    expect(cubeEdges(2, 'given', 'frame')).toHaveLength(12);
    const [point, drop] = pointWithDrop(0.5, -0.3, 1, 2) as unknown as [{ x: number; y: number }, { points: [number, number][] }];
    expect(drop.points[1]).toEqual([point.x, point.y]);
    expect(drop.points[0]).toEqual(project(0.5, -0.3, -2));
  });
});
