"use client";
import { Button } from "@/components/ui/button";

export function PrintButton() {
  return (
    <Button type="button" variant="quiet" onClick={() => window.print()}>
      Print
    </Button>
  );
}
