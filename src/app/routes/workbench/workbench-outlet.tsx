import { useRef } from 'react';
import { Outlet, useLocation } from 'react-router-dom';
import { isInputsWrite } from '@/features/workbench/form/inputs-write-state.ts';

/**
 * The workbench pages, remounted when someone navigates to another address (a shared link, a "start from"
 * picker, back or forward) so the page reads its inputs from the new URL; the page's own writes of its
 * inputs into the URL keep it mounted.
 */
export function WorkbenchOutlet() {
  const location = useLocation();
  const key = useRef(location.key);
  if (!isInputsWrite(location.state)) key.current = location.key;
  return <Outlet key={key.current} />;
}
