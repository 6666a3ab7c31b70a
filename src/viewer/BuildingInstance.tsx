/**
 * One animated copy of the building (the side-by-side view shows two). Geometry is built once per
 * model revision; each frame writes floor transforms into the floor groups and displaced positions
 * into the member buffers. Nothing here sets React state.
 */
import { useEffect, useMemo, useRef } from 'react'
import type { RefObject } from 'react'
import { useFrame } from '@react-three/fiber'
import * as THREE from 'three'
import type { Point } from '@/model'
import { SLAB_THICKNESS, writeAttachedPositions } from './buildingLayout'
import type { AttachedLines, AttachedMesh, BuildingLayout } from './buildingLayout'
import { rampColour } from './colourScale'
import type { ColourBy } from './colourScale'
import { historyFloorDofs, IDENTITY_TRANSFORM, modeTransforms, rigidTransform } from './modeAnimation'
import type { RigidTransform } from './modeAnimation'
import type { MotionSource } from './motionSource'
import type { AnimationClock, ViewerStore } from './viewerStore'

/** Resources shared by every instance (built once per model revision by the canvas). */
export interface SharedResources {
  /** Extruded slab geometry per slab id (typical floors share it). */
  readonly slabGeometry: ReadonlyMap<string, THREE.BufferGeometry>
  readonly slabEdges: ReadonlyMap<string, THREE.BufferGeometry>
  readonly ghostMembers: THREE.BufferGeometry
  readonly ghostMaterial: THREE.LineBasicMaterial
  readonly cmGeometry: THREE.BufferGeometry
  readonly crGeometry: THREE.BufferGeometry
  readonly cmMaterial: THREE.MeshBasicMaterial
  readonly crMaterial: THREE.MeshBasicMaterial
  readonly cmLineMaterial: THREE.LineBasicMaterial
  readonly crLineMaterial: THREE.LineBasicMaterial
}

export const SLAB_COLOUR = '#c9c3b6'
export const WALL_COLOUR = '#7b8794'
export const COLUMN_COLOUR = '#8e8577'
export const FRAME_COLOUR = '#4f6146'

export interface FloorMarks {
  readonly cm: readonly (Point | null)[]
  readonly cr: readonly (Point | null)[]
}

interface Props {
  readonly layout: BuildingLayout
  readonly shared: SharedResources
  readonly motion: MotionSource | null
  readonly marks: FloorMarks
  readonly store: ViewerStore
  readonly clock: AnimationClock
  readonly offsetX: number
  readonly visible: boolean
  readonly showGhost: boolean
  readonly showCentres: boolean
  /** Latest floor transforms (read by the plan trace). */
  readonly transformsOut?: RefObject<RigidTransform[]>
}

function meshGeometry(mesh: AttachedMesh): THREE.BufferGeometry {
  const g = new THREE.BufferGeometry()
  g.setAttribute('position', new THREE.BufferAttribute(mesh.positions.slice(), 3).setUsage(THREE.DynamicDrawUsage))
  g.setAttribute('normal', new THREE.BufferAttribute(mesh.normals, 3))
  g.setAttribute('color', new THREE.BufferAttribute(new Float32Array(mesh.positions.length), 3))
  g.setIndex(new THREE.BufferAttribute(mesh.indices, 1))
  g.computeBoundingSphere()
  return g
}

function lineGeometry(lines: AttachedLines): THREE.BufferGeometry {
  const g = new THREE.BufferGeometry()
  g.setAttribute('position', new THREE.BufferAttribute(lines.positions.slice(), 3).setUsage(THREE.DynamicDrawUsage))
  g.setAttribute('color', new THREE.BufferAttribute(new Float32Array(lines.positions.length), 3))
  return g
}

/** Rest points (x, y, z) attached to floors, for the CM and CR polylines. */
function markLine(
  layout: BuildingLayout,
  points: readonly (Point | null)[],
  material: THREE.LineBasicMaterial,
) {
  const rest: number[] = []
  const attach: number[] = []
  layout.floors.forEach((f, i) => {
    const p = points[i]
    if (!p) return
    rest.push(p.x, p.y, f.elevation + 0.35)
    attach.push(i)
  })
  const positions = new Float32Array(rest)
  const g = new THREE.BufferGeometry()
  g.setAttribute('position', new THREE.BufferAttribute(positions.slice(), 3).setUsage(THREE.DynamicDrawUsage))
  const line = new THREE.Line(g, material)
  line.frustumCulled = false
  return { geometry: g, line, rest: positions, attach: new Int32Array(attach) }
}

function writeColours(
  attr: THREE.BufferAttribute,
  story: Int32Array,
  values: readonly number[] | null,
  base: THREE.Color,
  shade: Float32Array | null,
): void {
  const arr = attr.array as Float32Array
  for (let v = 0; v < story.length; v++) {
    const t = values ? values[story[v]!] : undefined
    const k = shade ? shade[v]! : 1
    if (t === undefined) {
      arr[3 * v] = base.r * k
      arr[3 * v + 1] = base.g * k
      arr[3 * v + 2] = base.b * k
    } else {
      const [r, g, b] = rampColour(t)
      arr[3 * v] = r * k
      arr[3 * v + 1] = g * k
      arr[3 * v + 2] = b * k
    }
  }
  attr.needsUpdate = true
}

function colourValues(motion: MotionSource | null, by: ColourBy): readonly number[] | null {
  if (!motion || by === 'none') return null
  return by === 'drift' ? motion.colours.driftRatio : motion.colours.displacement
}

export function BuildingInstance(props: Props) {
  const { layout, shared, motion, marks, store, clock, offsetX, visible, transformsOut } = props
  const { showGhost, showCentres } = props
  const floorGroups = useRef<(THREE.Group | null)[]>([])
  const motionRef = useRef(motion)
  motionRef.current = motion
  const colourKey = useRef('')
  const transforms = useRef<RigidTransform[]>([])

  const own = useMemo(() => {
    const slabMaterials = layout.floors.map(
      () => new THREE.MeshBasicMaterial({ color: SLAB_COLOUR, vertexColors: true }),
    )
    const memberMaterial = new THREE.MeshBasicMaterial({ vertexColors: true })
    const frameMaterial = new THREE.LineBasicMaterial({ vertexColors: true })
    return {
      slabMaterials,
      memberMaterial,
      frameMaterial,
      walls: meshGeometry(layout.walls),
      columns: meshGeometry(layout.columns),
      frames: lineGeometry(layout.frames),
      cmLine: markLine(layout, marks.cm, shared.cmLineMaterial),
      crLine: markLine(layout, marks.cr, shared.crLineMaterial),
    }
  }, [layout, marks, shared])

  useEffect(
    () => () => {
      own.slabMaterials.forEach((m) => m.dispose())
      own.memberMaterial.dispose()
      own.frameMaterial.dispose()
      own.walls.dispose()
      own.columns.dispose()
      own.frames.dispose()
      own.cmLine.geometry.dispose()
      own.crLine.geometry.dispose()
      colourKey.current = ''
    },
    [own],
  )

  useFrame(() => {
    if (!visible) return
    const s = store.getState()
    const m = motionRef.current
    const n = layout.floors.length
    const out = transforms.current
    if (!m) {
      out.length = n
      out.fill(IDENTITY_TRANSFORM)
    } else if (m.kind === 'mode') {
      modeTransforms(m.dofs, m.unitScale * s.amplitude, clock.phase, out)
    } else {
      const th = m.history
      const step = Math.floor(clock.time / th.dt) % th.stepCount
      const dofs = historyFloorDofs(th.displacements, th.dofCount, step, m.unitScale * s.amplitude)
      out.length = dofs.length
      dofs.forEach((d, i) => (out[i] = rigidTransform(d)))
    }
    if (transformsOut) transformsOut.current = out
    layout.floors.forEach((f, i) => {
      const g = floorGroups.current[i]
      const tr = out[i] ?? IDENTITY_TRANSFORM
      if (!g) return
      g.position.set(tr.tx, tr.ty, f.elevation)
      g.rotation.set(0, 0, tr.angle)
    })
    const write = (geometry: THREE.BufferGeometry, rest: Float32Array, attach: Int32Array) => {
      const attr = geometry.getAttribute('position') as THREE.BufferAttribute
      writeAttachedPositions(rest, attach, out, attr.array as Float32Array)
      attr.needsUpdate = true
    }
    write(own.walls, layout.walls.positions, layout.walls.attach)
    write(own.columns, layout.columns.positions, layout.columns.attach)
    write(own.frames, layout.frames.positions, layout.frames.attach)
    write(own.cmLine.geometry, own.cmLine.rest, own.cmLine.attach)
    write(own.crLine.geometry, own.crLine.rest, own.crLine.attach)

    const key = `${s.colourBy}|${m ? `${m.kind}${m.kind === 'mode' ? m.mode : ''}` : '-'}`
    if (key !== colourKey.current || !m) {
      colourKey.current = key
      const values = colourValues(m, s.colourBy)
      writeColours(own.walls.getAttribute('color') as THREE.BufferAttribute, layout.walls.story, values, new THREE.Color(WALL_COLOUR), layout.walls.shade)
      writeColours(own.columns.getAttribute('color') as THREE.BufferAttribute, layout.columns.story, values, new THREE.Color(COLUMN_COLOUR), layout.columns.shade)
      writeColours(own.frames.getAttribute('color') as THREE.BufferAttribute, layout.frames.story, values, new THREE.Color(FRAME_COLOUR), null)
      const floorValues = !m || s.colourBy === 'none' ? null : s.colourBy === 'drift' ? m.colours.driftRatio : m.colours.displacement
      own.slabMaterials.forEach((mat, i) => {
        const t = floorValues?.[i]
        if (t === undefined) mat.color.set(SLAB_COLOUR)
        else mat.color.setRGB(...rampColour(t))
      })
    }
  })

  return (
    <group position={[offsetX, 0, 0]} visible={visible}>
      {layout.floors.map((f, i) => (
        <group
          key={f.id}
          ref={(g) => {
            floorGroups.current[i] = g
            if (g && !motion) g.position.set(0, 0, f.elevation)
          }}
        >
          {f.slabs.map((slab) => {
            const geometry = shared.slabGeometry.get(slab.id)
            const material = own.slabMaterials[i]
            return geometry && material ? (
              <mesh
                key={slab.id}
                geometry={geometry}
                material={material}
                position={[0, 0, -SLAB_THICKNESS]}
              />
            ) : null
          })}
          <CentreMarks cm={marks.cm[i] ?? null} cr={marks.cr[i] ?? null} shared={shared} visible={showCentres} />
        </group>
      ))}
      <mesh geometry={own.walls} material={own.memberMaterial} frustumCulled={false} />
      <mesh geometry={own.columns} material={own.memberMaterial} frustumCulled={false} />
      <lineSegments geometry={own.frames} material={own.frameMaterial} frustumCulled={false} />
      <group name="centre-lines" visible={showCentres}>
        <primitive object={own.cmLine.line} />
        <primitive object={own.crLine.line} />
      </group>
      <Ghost layout={layout} shared={shared} visible={showGhost} />
    </group>
  )
}

function CentreMarks(props: { cm: Point | null; cr: Point | null; shared: SharedResources; visible: boolean }) {
  const { cm, cr, shared, visible } = props
  return (
    <group visible={visible}>
      {cm && <mesh geometry={shared.cmGeometry} material={shared.cmMaterial} position={[cm.x, cm.y, 0.35]} />}
      {cr && <mesh geometry={shared.crGeometry} material={shared.crMaterial} position={[cr.x, cr.y, 0.35]} />}
    </group>
  )
}

function Ghost(props: { layout: BuildingLayout; shared: SharedResources; visible: boolean }) {
  const { layout, shared, visible } = props
  return (
    <group visible={visible}>
      {layout.floors.map((f) =>
        f.slabs.map((slab) => {
          const edges = shared.slabEdges.get(slab.id)
          return edges ? (
            <lineSegments
              key={`${f.id}:${slab.id}`}
              geometry={edges}
              material={shared.ghostMaterial}
              position={[0, 0, f.elevation - SLAB_THICKNESS]}
            />
          ) : null
        }),
      )}
      <lineSegments geometry={shared.ghostMembers} material={shared.ghostMaterial} />
    </group>
  )
}
