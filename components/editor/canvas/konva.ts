/**
 * The one door to react-konva: its documented "minimal bundle" entry (Konva's core plus only the
 * shapes we draw), so the editor does not ship every Konva shape and filter. A component that
 * needs another Konva shape imports it here (`import 'konva/lib/shapes/<Name>'`) and re-exports
 * its react-konva element; nothing else imports 'react-konva' directly.
 */
import 'konva/lib/shapes/Rect';
import 'konva/lib/shapes/Text';
import 'konva/lib/shapes/Circle';
import 'konva/lib/shapes/Image';
import 'konva/lib/shapes/Line';

export { Stage, Layer, Group, Shape, Rect, Text, Circle, Image, Line } from 'react-konva/lib/ReactKonvaCore';
