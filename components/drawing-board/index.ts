"use client";
/** Public face of the drawing board for pages and board-2's persistence/report. */
export { DrawingBoard, type DrawingBoardProps } from "./board";
export { useBoardApi, makeBoardApi, type BoardApi } from "./board-api";
export { createBoardStore, BoardStoreProvider, useBoard, useBoardStore, useDispatch, type BoardStore, type BoardState } from "./store";
export { commands, type CommandId } from "./commands";
